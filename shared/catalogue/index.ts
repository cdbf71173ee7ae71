export { builtMass, matchUnits, type UnitDemand, type UnitRanges } from './match-units'
export { lineTotal, quoteTotals, unitPrice, type PricedLine, type QuoteTotals } from './pricing'
