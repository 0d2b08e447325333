export {
  applyTaxMinor,
  currencyMinorDigits,
  formatMoney,
  formatPercent,
  isIsoCurrency,
  labourCostMinor,
  type TaxedAmount,
} from './money';
export { fromKm, toKm } from './distance';
