import type { TaxRate, TaxRateInput, TaxSettings } from '@shared/schemas/tax'
import { api } from './client'

export const taxApi = {
  settings: () => api.get<TaxSettings>('/api/tax-rates'),
  create: (body: TaxRateInput) => api.post<TaxRate>('/api/tax-rates', body),
  update: (id: number, body: TaxRateInput) => api.put<TaxRate>(`/api/tax-rates/${id}`, body),
  setCompanyRate: (companyId: number, taxRateId: number | null) =>
    api.put<TaxSettings>(`/api/tax-rates/companies/${companyId}`, { taxRateId }),
}
