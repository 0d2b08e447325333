export {
  VIN_ALPHABET,
  VIN_LENGTH,
  VIN_WEIGHTS,
  normaliseVin,
  vinCharValue,
  vinCheckDigit,
  vinWeightedSum,
} from './check-digit';
export { VIN_YEAR_CODES, vinModelYear, type VinModelYear, type VinModelYearOptions } from './model-year';
export {
  validateVin,
  type VinCheckDigitResult,
  type VinIssue,
  type VinOptions,
  type VinRegion,
  type VinResult,
} from './validate';
