/**
 * Units at the edge: a spec may carry unit strings ("5 mil", "1 oz", "2.4 GHz");
 * the library only ever sees SI numbers. Each field's quantity comes from the
 * library's own field descriptions, so "5 mil" is refused for a frequency.
 */
import { LineInputError, kindFields, parseQuantity, type FieldQuantity, type LineSpec } from '@linewright/lines';

/** One quantity (an SI number, or text such as "1 GHz") as an SI number; `field` is its request path. */
export function siValue(value: number | string, quantity: FieldQuantity, field: string): number {
  return typeof value === 'number' ? value : parseQuantity(value, quantity, field);
}

/**
 * Upper bounds on magnitudes the API accepts, by quantity: far beyond any
 * board or cable, yet small enough that every model stays finite (a 1e15 m
 * strip makes the closed forms overflow). Common practice, no source.
 */
const CEILINGS: Partial<Record<FieldQuantity, number>> = {
  length: 1e4,
  frequency: 1e13,
  conductivity: 1e9,
  relativePermittivity: 1e4,
  lossTangent: 10,
  electricField: 1e10,
  perLength: 1e5,
};

export function specToSi(input: Record<string, unknown>, path = 'spec'): LineSpec {
  const fields = new Map(kindFields(input['kind'] as LineSpec['kind']).map((field) => [field.name, field]));
  const spec: Record<string, unknown> = {};
  for (const [name, value] of Object.entries(input)) {
    const field = fields.get(name);
    const converted = typeof value === 'string' && field && field.quantity !== 'boolean' ? parseQuantity(value, field.quantity, `${path}.${name}`) : value;
    const ceiling = field && CEILINGS[field.quantity];
    if (ceiling !== undefined && typeof converted === 'number' && Math.abs(converted) > ceiling) {
      throw new LineInputError(`${path}.${name}`, `must be at most ${ceiling} in SI units`);
    }
    spec[name] = converted;
  }
  return spec as unknown as LineSpec;
}

/** Runs `compute`, naming the library's field errors by their request path (`w` → `spec.w`). */
export function withFieldPath<T>(path: string, compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    // The library names fields as the spec does; the client needs the path within the request.
    if (error instanceof LineInputError && !error.field.startsWith(`${path}.`)) throw new LineInputError(`${path}.${error.field}`, error.rule);
    throw error;
  }
}
