/**
 * Input rules shared by every line kind. Impossible input throws
 * LineInputError naming the spec field; input that is possible but outside a
 * method's published range produces a warning string with the same wording
 * everywhere (screen, API, PDF).
 */
import { LineInputError } from './errors';

/** Throws unless `value` is a finite number. */
export function requireFinite(field: string, value: unknown): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new LineInputError(field, 'must be a finite number');
  }
}

/** Throws unless `value` is finite and > 0. */
export function requirePositive(field: string, value: unknown): asserts value is number {
  requireFinite(field, value);
  if (value <= 0) throw new LineInputError(field, 'must be greater than zero');
}

/** Throws unless `value` is finite and ≥ 0. */
export function requireNonNegative(field: string, value: unknown): asserts value is number {
  requireFinite(field, value);
  if (value < 0) throw new LineInputError(field, 'must not be negative');
}

/** Throws unless `value` is finite and ≥ `minimum`. */
export function requireAtLeast(field: string, value: unknown, minimum: number): asserts value is number {
  requireFinite(field, value);
  if (value < minimum) throw new LineInputError(field, `must be at least ${minimum}`);
}

/** Throws unless value > other (e.g. D > d). */
export function requireGreater(field: string, value: number, otherField: string, other: number): void {
  if (!(value > other)) throw new LineInputError(field, `must be greater than ${otherField}`);
}

/** Throws unless value < other (e.g. t < b). */
export function requireLess(field: string, value: number, otherField: string, other: number): void {
  if (!(value < other)) throw new LineInputError(field, `must be less than ${otherField}`);
}

/** A published validity interval for one dimensionless quantity of a method. */
export interface ValidityRange {
  /** What is checked, as shown to the user, e.g. 'w/h'. */
  quantity: string;
  min: number;
  max: number;
  /** The method whose range this is, e.g. 'Hammerstad–Jensen 1980'. */
  method: string;
}

/** Formats a number for a warning: 4 significant digits, no exponent clutter. */
function formatValue(value: number): string {
  return Number(value.toPrecision(4)).toString();
}

/**
 * Adds a warning to `warnings` when `value` lies outside `range`; the text names
 * the quantity, the value, the range and the method.
 */
export function checkRange(warnings: string[], range: ValidityRange, value: number): void {
  if (value >= range.min && value <= range.max) return;
  warnings.push(
    `${range.quantity} = ${formatValue(value)} is outside ${formatValue(range.min)}–${formatValue(range.max)}, ` +
      `the validity range of ${range.method}; the result is less certain.`,
  );
}
