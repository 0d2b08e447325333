export {
  DTC_CONTROL_LABELS,
  DTC_SYSTEM_NAMES,
  type DtcClassification,
  type DtcControl,
  type DtcSystem,
} from './classify';
export {
  DTC_INPUT_MAX_LENGTH,
  classifyDtc,
  decodeDtc,
  decodeDtcWithFailureType,
  encodeDtc,
  isNormalDtc,
  normaliseDtc,
  parseDtc,
  type DtcCorrection,
  type DtcInputForm,
  type DtcParseError,
  type DtcParseResult,
  type DtcStructure,
} from './codec';
export { describeFailureType, type FailureTypeInfo } from './failure-type';
export {
  OBD_RESPONSE_MAX_LENGTH,
  decodeObdResponse,
  type ObdDtcResponse,
  type ObdDtcService,
  type ObdFraming,
  type ObdResponseResult,
} from './obd-response';
export { DTC_STATUS_BITS, decodeStatusByte, parseStatusByte, type StatusBit } from './status';
