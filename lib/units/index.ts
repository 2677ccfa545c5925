/**
 * Units, lengths and stations as text, and the comparison tolerance: the one place every screen, CSV
 * and sheet outside the engine turns a number in a bridge's units into text or text back into a number.
 */
export { decimalsFor, stationBlock, type Units } from './units';
export { LENGTH_TOLERANCE, PARALLEL_DETERMINANT, POINT_TOLERANCE, atLeast, atMost, nearlyEqual, nearlyZero, safeDivisor } from './tolerance';
export { differenceText, enteredLengthText, lengthText, readingLength, slopeText, tapeAndDecimalLength, tapeLength } from './length-text';
export { offsetText, stationsAlong, stationText } from './station-text';
export { deviationText, toleranceText, type MeasureKind } from './deviation-text';
export { effectiveStyle, elevationCell, lengthCell, lengthUnit, lengthWithUnit, offsetCell, type DisplayStyle } from './table-cells';
export { parseLength } from './parse-length';
export { numberInputText, parseNumber, parsePercent, parseStation, percentInputText, stationInputText, type Parsed } from './input-text';
export { dateTimeText } from './date-text';
