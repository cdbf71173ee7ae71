import type {
  CatalogueOption,
  CatalogueOptionInput,
  ProductLine,
  ProductLineInput,
  UnitMatch,
} from '@shared/schemas/catalogue'
import { api } from './client'

export const catalogueApi = {
  lines: (includeInactive = false) =>
    api.get<ProductLine[]>(`/api/catalogue/lines${includeInactive ? '?includeInactive=true' : ''}`),
  createLine: (body: ProductLineInput) => api.post<ProductLine>('/api/catalogue/lines', body),
  updateLine: (id: number, body: ProductLineInput) =>
    api.put<ProductLine>(`/api/catalogue/lines/${id}`, body),
  options: (includeInactive = false) =>
    api.get<CatalogueOption[]>(
      `/api/catalogue/options${includeInactive ? '?includeInactive=true' : ''}`,
    ),
  createOption: (body: CatalogueOptionInput) =>
    api.post<CatalogueOption>('/api/catalogue/options', body),
  updateOption: (id: number, body: CatalogueOptionInput) =>
    api.put<CatalogueOption>(`/api/catalogue/options/${id}`, body),
  /** product lines against a sizing, or against its absorber n (1-based) of a set */
  matches: (sizingId: number, absorber?: number) =>
    api.get<UnitMatch[]>(
      `/api/catalogue/matches?sizingId=${sizingId}${absorber ? `&absorber=${absorber}` : ''}`,
    ),
}
