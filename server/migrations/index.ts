import { Foundation1796194970085 } from './1796194970085-Foundation'
import { Sites1796195382472 } from './1796195382472-Sites'
import { Commerce1796197028777 } from './1796197028777-Commerce'
import { ModelsSizings1796198622102 } from './1796198622102-ModelsSizings'
import { Payments1796201603698 } from './1796201603698-Payments'
import { Production1796202027823 } from './1796202027823-Production'
import { Measurements1796202424685 } from './1796202424685-Measurements'
import { DesignGates1796267311937 } from './1796267311937-DesignGates'
import { Resilience1796300000000 } from './1796300000000-Resilience'
import { ListIndexes1796400000000 } from './1796400000000-ListIndexes'
import { RecordChannels1796400000001 } from './1796400000001-RecordChannels'
import { TaxRates1796400000002 } from './1796400000002-TaxRates'
import { WorkOrderShipping1796500000000 } from './1796500000000-WorkOrderShipping'
import { AbsorberSets1796510000000 } from './1796510000000-AbsorberSets'
import { QuoteListColumns1796720000000 } from './1796720000000-QuoteListColumns'
import { HandedOverIndex1796720000001 } from './1796720000001-HandedOverIndex'

/** Every migration class in order; a new migration is added here too. */
export const migrations = [
  Foundation1796194970085,
  Sites1796195382472,
  Commerce1796197028777,
  ModelsSizings1796198622102,
  Payments1796201603698,
  Production1796202027823,
  Measurements1796202424685,
  DesignGates1796267311937,
  Resilience1796300000000,
  ListIndexes1796400000000,
  RecordChannels1796400000001,
  TaxRates1796400000002,
  WorkOrderShipping1796500000000,
  AbsorberSets1796510000000,
  QuoteListColumns1796720000000,
  HandedOverIndex1796720000001,
]
