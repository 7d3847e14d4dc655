// Price books and pricing: pure functions from a takeoff and a price-book version to a priced estimate.
export * from './price-book-schema';
export * from './priced-estimate-schema';
export {
  PricingDecimal,
  MONEY_ROUNDING,
  UNIT_COST_DECIMALS,
  toDecimal,
  roundMoney,
  roundUnitCost,
  formatMoney,
  formatUnitCost,
  formatPercent,
  percentToFraction,
  sumDecimals,
} from './money';
export { allocate } from './allocate';
export { markupToMarginPct, marginToMarkupPct, marginPercentSchema } from './markup-margin';
export { engineParametersFromPriceBook } from './engine-parameters';
export { demoPriceBook } from './demo-price-book';
export { priceLine, roundQuantity, type LineDraft } from './price-line';
export { reducePricedLines, type LineReduction } from './reduce-lines';
export { cheapestMaterial, smallestMaterialAtLeast } from './choose-material';
export { materialLines } from './material-lines';
export { laborLines, burdenedRate, LABOR_TASK_LABELS } from './labor-lines';
export { equipmentLines, equipmentDays } from './equipment-lines';
export { disposalLines } from './disposal-lines';
export { estimateTotals } from './estimate-totals';
export {
  priceTakeoff,
  LIGHTING_OPTION_ID,
  type PriceTakeoffArgs,
  type EstimateOptionInput,
} from './price-takeoff';
export {
  priceBookToCsv,
  priceBookFromCsv,
  CSV_COLUMNS,
  CSV_SECTIONS,
  type CsvError,
} from './price-book-csv';
export {
  diffPriceBooks,
  diffPricedEstimates,
  type PriceBookChange,
  type PriceBookSection,
  type PricedLineChange,
  type PricedTotalChange,
} from './price-book-diff';
