import { CompanyEntity } from './modules/companies/company.entity'
import { UserEntity } from './modules/users/user.entity'
import { UserTokenEntity } from './modules/auth/user-token.entity'
import { SiteEntity } from './modules/sites/site.entity'
import { SitePhotoEntity } from './modules/sites/site-photo.entity'
import { HostModelEntity } from './modules/models/host-model.entity'
import { ModelRevisionEntity } from './modules/models/model-revision.entity'
import { SizingEntity } from './modules/sizings/sizing.entity'
import { SizingRevisionEntity } from './modules/sizings/sizing-revision.entity'
import { SizingAcknowledgementEntity } from './modules/sizings/sizing-acknowledgement.entity'
import { MeasurementRecordEntity } from './modules/measurements/measurement-record.entity'
import { RecordAnalysisEntity } from './modules/measurements/record-analysis.entity'
import { PaymentSessionEntity } from './modules/payments/payment-session.entity'
import { PaymentEventEntity } from './modules/payments/payment-event.entity'
import { OrderEntity } from './modules/payments/order.entity'
import { WorkOrderEntity } from './modules/production/work-order.entity'
import { WorkOrderEventEntity } from './modules/production/work-order-event.entity'
import { ProductLineEntity } from './modules/catalogue/product-line.entity'
import { CatalogueOptionEntity } from './modules/catalogue/catalogue-option.entity'
import { ContactEntity } from './modules/customers/contact.entity'
import { QuoteEntity } from './modules/quotes/quote.entity'
import { QuoteLineEntity } from './modules/quotes/quote-line.entity'
import { QuoteEventEntity } from './modules/quotes/quote-event.entity'
import { OutboxMailEntity } from './modules/outbox/outbox-mail.entity'
import { CompanyTaxRateEntity, TaxRateEntity } from './modules/tax/tax-rate.entity'

/** Every entity class, listed (no globs: esbuild-built code has no stable file layout). */
export const entities = [
  CompanyEntity,
  UserEntity,
  UserTokenEntity,
  SiteEntity,
  SitePhotoEntity,
  HostModelEntity,
  ModelRevisionEntity,
  SizingEntity,
  SizingRevisionEntity,
  SizingAcknowledgementEntity,
  MeasurementRecordEntity,
  RecordAnalysisEntity,
  PaymentSessionEntity,
  PaymentEventEntity,
  OrderEntity,
  WorkOrderEntity,
  WorkOrderEventEntity,
  ProductLineEntity,
  CatalogueOptionEntity,
  ContactEntity,
  QuoteEntity,
  QuoteLineEntity,
  QuoteEventEntity,
  OutboxMailEntity,
  TaxRateEntity,
  CompanyTaxRateEntity,
]
