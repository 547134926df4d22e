/**
 * The figures compared side by side, as numbers, with each candidate's
 * difference from the first — the reference the others are read against.
 */
import type { LineResult } from '@linewright/lines';

export interface ComparedFigure {
  id: string;
  label: string;
  unit: string;
  /** The figure in the shown unit, or undefined when the line has none (e.g. zDiff of a single line). */
  read(result: LineResult): number | undefined;
}

export const COMPARED_FIGURES: readonly ComparedFigure[] = [
  { id: 'z0', label: 'Z0', unit: 'Ω', read: (r) => r.z0 },
  { id: 'zDiff', label: 'Differential Z', unit: 'Ω', read: (r) => r.zDiff },
  { id: 'zCommon', label: 'Common-mode Z', unit: 'Ω', read: (r) => r.zCommon },
  { id: 'erEff', label: 'εeff', unit: '', read: (r) => r.erEff },
  { id: 'delayPerMeter', label: 'Delay per length', unit: 'ps/mm', read: (r) => r.delayPerMeter * 1e9 },
  { id: 'velocityFactor', label: 'Velocity factor', unit: 'c', read: (r) => r.velocityFactor },
  { id: 'lPerMeter', label: 'Inductance', unit: 'nH/m', read: (r) => r.lPerMeter * 1e9 },
  { id: 'cPerMeter', label: 'Capacitance', unit: 'pF/m', read: (r) => r.cPerMeter * 1e12 },
  { id: 'lossDbPerMeter', label: 'Loss at frequency', unit: 'dB/m', read: (r) => r.lossDbPerMeter },
  { id: 'delay', label: 'Delay over length', unit: 'ns', read: (r) => (r.delay === undefined ? undefined : r.delay * 1e9) },
];

/** A difference below this (relative) is shown as "same". */
export const NOTABLE_DIFFERENCE = 0.01;

export interface ComparisonCell {
  value?: number;
  /** Relative difference from the first candidate; undefined for the first or when either lacks the figure. */
  difference?: number;
  isNotable: boolean;
}

export interface ComparisonRow {
  figure: ComparedFigure;
  cells: ComparisonCell[];
}

/** Rows for every figure at least one candidate has; `results[i]` undefined when candidate i is invalid. */
export function comparisonRows(results: readonly (LineResult | undefined)[]): ComparisonRow[] {
  return COMPARED_FIGURES.map((figure) => {
    const values = results.map((result) => (result ? figure.read(result) : undefined));
    const reference = values[0];
    const cells = values.map((value, index): ComparisonCell => {
      if (index === 0 || value === undefined || reference === undefined || reference === 0) return { value, isNotable: false };
      const difference = (value - reference) / Math.abs(reference);
      return { value, difference, isNotable: Math.abs(difference) >= NOTABLE_DIFFERENCE };
    });
    return { figure, cells };
  }).filter((row) => row.cells.some((cell) => cell.value !== undefined));
}
