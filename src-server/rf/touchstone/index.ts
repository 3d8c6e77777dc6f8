/** The Touchstone reader's public face: read a file, name its parts, and the error it refuses a file with. */
export { TouchstoneError, type TouchstoneErrorCode, type TouchstoneErrorKind } from './errors';
export { sParameter } from './network';
export { portsFromFileName, readTouchstone } from './reader';
export {
  type ComplexSeries,
  type DataFormat,
  type FrequencyUnit,
  type MatrixFormat,
  type NetworkParameter,
  type TouchstoneNetwork,
  type TouchstoneReadOptions,
  type TwoPortDataOrder,
  FREQUENCY_UNIT_HZ,
  TOUCHSTONE_MAX_BYTES,
  TOUCHSTONE_MAX_LINE_BYTES,
  TOUCHSTONE_MAX_POINTS,
  TOUCHSTONE_MAX_PORTS,
} from './types';
