import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  CompanyTaxRateSchema,
  TaxRateInputSchema,
  TaxRateSchema,
  TaxSettingsSchema,
} from '../../../shared/schemas/tax'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { TaxService } from './tax.service'

export function taxRouter(api: ApiRegistry, tax: TaxService) {
  const routes = routeTable(api, 'Tax rates', ACCESS.tax)
  routes.get('/api/tax-rates', {
    summary: 'Named tax rates, the default, and each customer company’s own rate',
    response: TaxSettingsSchema,
    answer: () => tax.settings(),
  })
  routes.post('/api/tax-rates', {
    summary: 'Add a named tax rate',
    response: TaxRateSchema,
    body: TaxRateInputSchema,
    status: 201,
    answer: ({ body }) => tax.save(null, body),
  })
  routes.put('/api/tax-rates/:id', {
    summary: 'Change a tax rate; quotes priced afterwards use the new rate',
    response: TaxRateSchema,
    params: IdParamSchema,
    body: TaxRateInputSchema,
    answer: ({ params, body }) => tax.save(params.id, body),
  })
  routes.put('/api/tax-rates/companies/:id', {
    summary: 'Give a customer company its own tax rate, or null for the default',
    response: TaxSettingsSchema,
    params: IdParamSchema,
    body: CompanyTaxRateSchema,
    answer: ({ params, body }) => tax.setCompanyRate(params.id, body.taxRateId),
  })
  return routes.router
}
