/**
 * Numbers as engineers read them: an SI prefix chosen so the mantissa sits in
 * [1, 1000), a fixed count of significant digits, and the unit always shown.
 */
const PREFIXES: readonly [number, string][] = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'], [1e-15, 'f'],
];

/** `engineering(3.2e-7, 'H/m')` → "320 nH/m"; `engineering(0, 'Ω')` → "0 Ω". */
export function engineering(value: number, unit: string, significantDigits = 4): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return `0 ${unit}`;
  const magnitude = Math.abs(value);
  const [scale, prefix] = PREFIXES.find(([candidate]) => magnitude >= candidate * 0.9995) ?? PREFIXES[PREFIXES.length - 1];
  return `${trimmed(value / scale, significantDigits)} ${prefix}${unit}`;
}

/** A plain number with `significantDigits` digits, without trailing zeros after the point. */
export function trimmed(value: number, significantDigits = 4): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toPrecision(significantDigits);
  if (text.includes('e')) return Number(text).toString();
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}
