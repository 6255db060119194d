/** Project units: SI in storage and in the core, the project's units on screen, in files and in the PDF. */
export { displayUnits, unitSystemName, type DisplayUnits } from './labels';
export {
  formatDistance,
  formatDuration,
  formatHeadPressure,
  formatPercent,
  formatPressureOfHead,
  formatQuantity,
  formatStation,
  formatTemperature,
  inputValue,
} from './format';
export { unitDefaults, type UnitDefaults } from './defaults';
export { autoDecimals, formatNumber, formatPlainNumber } from './number';
export {
  fromDisplay,
  pressureOfHead,
  toDisplay,
  unitDef,
  unitOf,
  UNIT_SYSTEMS,
  type Decimals,
  type Quantity,
  type UnitDef,
  type UnitSystem,
} from './quantities';
