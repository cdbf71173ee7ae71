import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  CompanyTaxRateSchema,
  TaxRateInputSchema,
  TaxRateSchema,
  TaxSettingsSchema,
} from '../../../shared/schemas/tax'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { TaxService } from './tax.service'

export function taxRouter(api: ApiRegistry, tax: TaxService) {
  const router = Router()
  const admin = { tag: 'Tax rates', access: ACCESS.tax.write }
  route(
    router,
    api,
    {
      tag: 'Tax rates',
      access: ACCESS.tax.read,
      method: 'get',
      path: '/api/tax-rates',
      summary: 'Named tax rates, the default, and each customer company’s own rate',
      response: TaxSettingsSchema,
    },
    () => tax.settings(),
  )
  route(
    router,
    api,
    {
      ...admin,
      method: 'post',
      path: '/api/tax-rates',
      summary: 'Add a named tax rate',
      response: TaxRateSchema,
      body: TaxRateInputSchema,
      status: 201,
    },
    ({ body }) => tax.save(null, body),
  )
  route(
    router,
    api,
    {
      ...admin,
      method: 'put',
      path: '/api/tax-rates/:id',
      summary: 'Change a tax rate; quotes priced afterwards use the new rate',
      response: TaxRateSchema,
      params: IdParamSchema,
      body: TaxRateInputSchema,
    },
    ({ params, body }) => tax.save(params.id, body),
  )
  route(
    router,
    api,
    {
      ...admin,
      method: 'put',
      path: '/api/tax-rates/companies/:id',
      summary: 'Give a customer company its own tax rate, or null for the default',
      response: TaxSettingsSchema,
      params: IdParamSchema,
      body: CompanyTaxRateSchema,
    },
    ({ params, body }) => tax.setCompanyRate(params.id, body.taxRateId),
  )
  return router
}
