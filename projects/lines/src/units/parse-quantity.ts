/**
 * Reads a quantity typed by a person or a script ("5 mil", "0.2 mm", "35 um",
 * "1 oz", "2.4 GHz") into an SI number. The only module that loads mathjs, so
 * the hot path (calculate) never does.
 */
import { all, create, type MathJsInstance, type Unit } from 'mathjs';
import { LineInputError } from '../errors';
import type { FieldQuantity } from '../kinds/line-model';
import { COPPER_OUNCE_THICKNESS } from './length-units';

let instance: MathJsInstance | undefined;

/**
 * The mathjs instance, made on first use: nothing runs at import time, so a browser
 * bundle that never parses text can drop mathjs entirely (it is marked side-effect free).
 */
function mathjs(): MathJsInstance {
  if (!instance) {
    instance = create(all);
    // mathjs's 'oz' is the mass ounce; copper weight gets its own unit, and "oz" in input is mapped to it below.
    instance.createUnit('copperOunce', `${COPPER_OUNCE_THICKNESS} m`);
  }
  return instance;
}

/** The SI unit each dimensional field quantity is returned in. */
const SI_UNITS: Partial<Record<FieldQuantity, string>> = {
  length: 'm',
  frequency: 'Hz',
  conductivity: 'S/m',
  electricField: 'V/m',
};

/** Longer input is refused rather than parsed: nobody types a 100-character quantity. */
const MAX_LENGTH = 100;

/** Bare numbers (no unit) are taken as SI. */
const BARE_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
/** "30 /m", "0.8/in", "12 per ft": a count per length. */
const PER_LENGTH = /^(.+?)\s*(?:\/|per\s+)\s*([a-zµμ]+)$/i;

/**
 * An SI number from text such as '5 mil', '0.2 mm', '35 um', '1 oz' (copper
 * weight as foil thickness, 1 oz = 1.37 mil ≈ 34.8 µm), '2.4 GHz', '20 kV/mm',
 * '30 /m'. A bare number is taken as already SI.
 * Throws LineInputError(field) for unreadable text or a unit of the wrong kind.
 */
export function parseQuantity(text: string, quantity: FieldQuantity, field = 'value'): number {
  const input = String(text).trim();
  if (input.length === 0 || input.length > MAX_LENGTH) throw new LineInputError(field, 'must be a number with an optional unit');
  if (BARE_NUMBER.test(input)) return Number(input);
  if (quantity === 'perLength') return parsePerLength(input, field);
  const siUnit = SI_UNITS[quantity];
  if (!siUnit) throw new LineInputError(field, 'must be a plain number (this quantity has no unit)');
  const unit = readUnit(normalise(input), field);
  if (!unit.equalBase(mathjs().unit(siUnit))) throw new LineInputError(field, `must be a ${quantity} (e.g. in ${siUnit})`);
  return unit.toNumber(siUnit);
}

function parsePerLength(input: string, field: string): number {
  const match = PER_LENGTH.exec(input);
  if (!match || !BARE_NUMBER.test(match[1].trim())) throw new LineInputError(field, 'must be a count per length, e.g. 30 /m');
  const unit = readUnit(`1 ${normalise(match[2])}`, field);
  if (!unit.equalBase(mathjs().unit('m'))) throw new LineInputError(field, 'must be a count per length, e.g. 30 /m');
  return Number(match[1]) / unit.toNumber('m');
}

/** µ/μ become mathjs's 'u' prefix; the copper 'oz' becomes copperOunce. */
function normalise(input: string): string {
  return input.replace(/[µμ]/g, 'u').replace(/(^|[\d\s.])oz\b/g, '$1copperOunce');
}

function readUnit(input: string, field: string): Unit {
  try {
    return mathjs().unit(input);
  } catch {
    // mathjs throws a plain SyntaxError for text it cannot read; callers need the typed error with the field.
    throw new LineInputError(field, 'must be a number with a known unit, e.g. 5 mil, 0.2 mm, 1 oz, 2.4 GHz');
  }
}
