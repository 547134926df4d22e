/**
 * CSV at the stackup's edges (RFC 4180 through csv-stringify / csv-parse):
 * the impedance table as a fabricator reads it — lengths in millimetres,
 * impedance in ohms, delay in ps/mm, the unit in each header — and the
 * readers for the files that come back. The fabricator's reply uses the same
 * columns, so an exported table reads back unchanged.
 */
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { LineInputError, parseQuantity } from '@linewright/lines';
import { Problem, type FieldProblem } from '../errors';
import type { StackupTable } from './stackup-table';

export const TABLE_COLUMNS = [
  'label',
  'layer',
  'structure',
  'kind',
  'target_ohm',
  'tolerance_percent',
  'width_mm',
  'gap_mm',
  'height_above_mm',
  'height_below_mm',
  'reference_layers',
  'impedance_ohm',
  'delay_ps_per_mm',
] as const;

export const MILLIMETRE = 1e-3;
export const PICOSECONDS_PER_MILLIMETRE = 1e-12 / 1e-3;
/** More rows than this is not an impedance table or a coupon trace. */
export const MAX_CSV_ROWS = 100_000;
const BARE_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Rounded for people, not for computation: 0.1 µm, 0.01 Ω, 0.001 ps/mm. */
const fixed = (value: number, digits: number) => Number(value.toFixed(digits));

export function tableCsv(table: StackupTable): string {
  const rows = table.rows.map((row) => [
    row.label,
    row.layerName,
    row.structure,
    row.kind,
    row.targetImpedance,
    fixed(row.tolerance * 100, 3),
    fixed(row.width / MILLIMETRE, 4),
    row.gap === null ? '' : fixed(row.gap / MILLIMETRE, 4),
    fixed(row.heightAbove / MILLIMETRE, 4),
    fixed(row.heightBelow / MILLIMETRE, 4),
    row.referenceLayers.join(' / '),
    fixed(row.impedance, 2),
    fixed(row.delayPerMeter / PICOSECONDS_PER_MILLIMETRE, 3),
  ]);
  return stringify(rows, { header: true, columns: [...TABLE_COLUMNS], record_delimiter: '\r\n' });
}

/** The data rows of an uploaded CSV with a header row; 400 naming `file` when it cannot be read. */
export function csvRows(csv: Buffer | undefined): Record<string, string>[] {
  if (!csv) throw Problem.badRequest('Send the CSV as the multipart field "file".', [{ field: 'file', detail: 'is required' }]);
  let rows: Record<string, string>[];
  try {
    rows = parse(csv, { columns: true, skip_empty_lines: true, trim: true, bom: true, max_record_size: 64 * 1024 });
  } catch (error) {
    // csv-parse throws for malformed text (unclosed quote, ragged row); that is the client's mistake, not ours.
    throw Problem.badRequest(`The file is not readable CSV: ${(error as Error).message}`, [{ field: 'file', detail: 'is not readable CSV' }]);
  }
  if (rows.length === 0) throw Problem.badRequest('The CSV has no data rows.', [{ field: 'file', detail: 'has no data rows' }]);
  if (rows.length > MAX_CSV_ROWS) throw Problem.badRequest(`The CSV has ${rows.length} rows; at most ${MAX_CSV_ROWS} are accepted.`, [{ field: 'file', detail: `has more than ${MAX_CSV_ROWS} rows` }]);
  return rows;
}

/**
 * A number cell: a bare number in the column's unit (`scale` SI per unit), or
 * a length with its own unit ("4.5 mil") when `isLength`. Problems are added
 * to `problems` under `field`; the answer is then undefined.
 */
export function numberCell(cell: string | undefined, field: string, scale: number, problems: FieldProblem[], options: { isLength?: boolean; isRequired?: boolean } = {}): number | undefined {
  if (cell === undefined || cell === '') {
    if (options.isRequired) problems.push({ field, detail: 'is required' });
    return undefined;
  }
  if (BARE_NUMBER.test(cell)) return Number(cell) * scale;
  if (options.isLength) {
    try {
      return parseQuantity(cell, 'length', field);
    } catch (error) {
      // A unit string that does not parse belongs in the row report, not as the whole answer.
      if (!(error instanceof LineInputError)) throw error;
      problems.push({ field, detail: error.rule });
      return undefined;
    }
  }
  problems.push({ field, detail: `must be a number, not "${cell}"` });
  return undefined;
}

/** 400 listing every problem, saying how many rows have one and that nothing was stored. */
export function rowProblems(problems: FieldProblem[], rowCount: number): Problem {
  const rows = new Set(problems.map((problem) => problem.field.split('.')[0]).filter((field) => field.startsWith('rows[')));
  const scope = rows.size > 0 ? `${rows.size} of ${rowCount} rows have problems` : 'The file has problems';
  return Problem.badRequest(`${scope}; nothing was stored.`, problems);
}

