/**
 * A test-coupon measurement: impedance against time (a TDR trace) or
 * distance, one column per line of the table, named by its label. Each line
 * passes when every sample inside the evaluation window lies within its target
 * ± tolerance. The window defaults to the middle 30–70 % of the trace, clear
 * of the probe launch and the coupon's far end (common practice, no source).
 * Every cell is checked first; any problem answers 400 naming `rows[N].column`
 * and nothing is stored.
 */
import { ESTIMATE_NOTE } from '@linewright/lines';
import { Problem, type FieldProblem } from '../errors';
import { csvRows, numberCell, rowProblems } from './stackup-csv';
import type { StackupTable } from './stackup-table';

/** First-column names and their SI scale. */
const AXES: Record<string, { axis: 'time' | 'distance'; scale: number }> = {
  time_s: { axis: 'time', scale: 1 },
  time_ns: { axis: 'time', scale: 1e-9 },
  time_ps: { axis: 'time', scale: 1e-12 },
  distance_m: { axis: 'distance', scale: 1 },
  distance_mm: { axis: 'distance', scale: 1e-3 },
};
export const DEFAULT_WINDOW: readonly [number, number] = [0.3, 0.7];
const MIN_SAMPLES = 5;
/** Samples kept per line for the chart; the verdict uses every sample. */
const MAX_TRACE_POINTS = 1000;

export interface CouponLine {
  label: string;
  placementId: string;
  targetImpedance: number;
  tolerance: number;
  /** Linewright's computed impedance for the line [Ω]. */
  computedImpedance: number;
  bandLow: number;
  bandHigh: number;
  /** Window samples: mean, lowest, highest [Ω]; how many lie outside the band. */
  measured: { mean: number; min: number; max: number; samples: number; outside: number };
  isPass: boolean;
  /** The trace, thinned to at most MAX_TRACE_POINTS: x (SI) and impedance. */
  trace: { x: number[]; impedance: number[] };
}

export interface CouponReport {
  axis: 'time' | 'distance';
  /** The evaluation window in the axis' SI unit. */
  window: { from: number; to: number };
  lines: CouponLine[];
  passed: number;
  failed: number;
  note: string;
}

export function evaluateCoupon(csv: Buffer | undefined, table: StackupTable, windowFractions: readonly [number, number] = DEFAULT_WINDOW): CouponReport {
  const [start, end] = windowFractions;
  if (!(start >= 0 && end <= 1 && start < end)) {
    throw Problem.badRequest('The window must be two fractions 0 ≤ from < to ≤ 1 of the trace.', [{ field: 'windowFrom', detail: 'needs 0 ≤ windowFrom < windowTo ≤ 1' }]);
  }
  const rows = csvRows(csv);
  const columns = Object.keys(rows[0]);
  const axisColumn = columns[0];
  const axis = AXES[axisColumn];
  const problems: FieldProblem[] = [];
  if (!axis) problems.push({ field: `columns.${axisColumn}`, detail: `the first column must be one of ${Object.keys(AXES).join(', ')}` });
  const byLabel = new Map(table.rows.map((row) => [row.label.toLowerCase(), row]));
  const lineColumns = columns.slice(1);
  if (lineColumns.length === 0) problems.push({ field: 'columns', detail: 'needs a column per measured line, named by its label' });
  for (const column of lineColumns) if (!byLabel.has(column.toLowerCase())) problems.push({ field: `columns.${column}`, detail: 'is not the label of a line of this stackup' });
  if (rows.length < MIN_SAMPLES) problems.push({ field: 'file', detail: `needs at least ${MIN_SAMPLES} samples` });
  if (problems.length > 0) throw rowProblems(problems, rows.length);

  const x: number[] = [];
  const traces = lineColumns.map(() => [] as (number | undefined)[]);
  rows.forEach((cells, index) => {
    const path = `rows[${index + 1}]`;
    const value = numberCell(cells[axisColumn], `${path}.${axisColumn}`, axis.scale, problems, { isRequired: true });
    if (value !== undefined && x.length > 0 && !(value > x[x.length - 1])) problems.push({ field: `${path}.${axisColumn}`, detail: 'must increase from row to row' });
    x.push(value ?? Number.NaN);
    lineColumns.forEach((column, line) => {
      const impedance = numberCell(cells[column], `${path}.${column}`, 1, problems);
      if (impedance !== undefined && !(impedance > 0)) problems.push({ field: `${path}.${column}`, detail: 'must be an impedance above zero' });
      traces[line].push(impedance);
    });
  });
  if (problems.length > 0) throw rowProblems(problems, rows.length);

  const from = x[0] + start * (x[x.length - 1] - x[0]);
  const to = x[0] + end * (x[x.length - 1] - x[0]);
  const lines = lineColumns.map((column, line) => couponLine(byLabel.get(column.toLowerCase())!, x, traces[line], from, to));
  if (lines.some((entry) => entry.measured.samples === 0)) {
    const empty = lines.find((entry) => entry.measured.samples === 0)!;
    throw rowProblems([{ field: `columns.${empty.label}`, detail: 'has no samples inside the evaluation window' }], rows.length);
  }
  return { axis: axis.axis, window: { from, to }, lines, passed: lines.filter((entry) => entry.isPass).length, failed: lines.filter((entry) => !entry.isPass).length, note: ESTIMATE_NOTE };
}

function couponLine(row: StackupTable['rows'][number], x: number[], trace: (number | undefined)[], from: number, to: number): CouponLine {
  const bandLow = row.targetImpedance * (1 - row.tolerance);
  const bandHigh = row.targetImpedance * (1 + row.tolerance);
  const inWindow = trace.filter((value, index): value is number => value !== undefined && x[index] >= from && x[index] <= to);
  const outside = inWindow.filter((value) => value < bandLow || value > bandHigh).length;
  const sum = inWindow.reduce((total, value) => total + value, 0);
  const stride = Math.max(1, Math.ceil(x.length / MAX_TRACE_POINTS));
  const kept = x.map((_, index) => index).filter((index) => index % stride === 0 && trace[index] !== undefined);
  return {
    label: row.label,
    placementId: row.placementId,
    targetImpedance: row.targetImpedance,
    tolerance: row.tolerance,
    computedImpedance: row.impedance,
    bandLow,
    bandHigh,
    measured: {
      mean: inWindow.length > 0 ? sum / inWindow.length : Number.NaN,
      min: inWindow.reduce((lowest, value) => Math.min(lowest, value), Infinity),
      max: inWindow.reduce((highest, value) => Math.max(highest, value), -Infinity),
      samples: inWindow.length,
      outside,
    },
    isPass: inWindow.length > 0 && outside === 0,
    trace: { x: kept.map((index) => x[index]), impedance: kept.map((index) => trace[index]!) },
  };
}
