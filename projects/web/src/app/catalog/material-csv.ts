/**
 * Reads a materials CSV in the browser so every row's problems show before
 * anything is sent. The server has no dry-run mode, so this preview repeats
 * its checks that need no database (schema limits, units, repeated names);
 * names already in the catalog are found by the server on commit, and its
 * per-row answer (`rows[N].column`) is merged into the same preview.
 */
import type { FieldProblem } from '../core/api-problem';

/** The columns the import reads (server/materials/materials-csv.ts). */
export const MATERIAL_CSV_COLUMNS = ['name', 'description', 'dk', 'df', 'referenceFrequency', 'dielectricStrength', 'notes'] as const;
export const MAX_IMPORT_ROWS = 1000;
const BARE_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const FREQUENCY = /^(\d+\.?\d*|\.\d+)(e[+-]?\d+)?\s*(Hz|kHz|MHz|GHz)$/i;
const FIELD_STRENGTH = /^(\d+\.?\d*|\.\d+)(e[+-]?\d+)?\s*(V|kV|MV)\/(m|mm|um|µm|mil)$/i;

export interface PreviewRow {
  /** Counted from 1 after the header, as the server names rows. */
  row: number;
  cells: Record<string, string>;
  problems: string[];
}

export interface CsvPreview {
  rows: PreviewRow[];
  /** Problems of the file as a whole (header, size). */
  fileProblems: string[];
}

/** RFC 4180 records: quoted fields, doubled quotes, CRLF or LF. */
export function csvRecords(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let field = '';
  let isQuoted = false;
  const source = text.replace(/^\uFEFF/, '');
  for (let index = 0; index < source.length; index++) {
    const character = source[index];
    if (isQuoted) {
      if (character === '"' && source[index + 1] === '"') {
        field += '"';
        index++;
      } else if (character === '"') isQuoted = false;
      else field += character;
    } else if (character === '"' && field === '') isQuoted = true;
    else if (character === ',') {
      record.push(field);
      field = '';
    } else if (character === '\n' || character === '\r') {
      if (character === '\r' && source[index + 1] === '\n') index++;
      record.push(field);
      records.push(record);
      record = [];
      field = '';
    } else field += character;
  }
  if (field !== '' || record.length > 0) {
    record.push(field);
    records.push(record);
  }
  return records.filter((cells) => cells.some((cell) => cell.trim() !== ''));
}

function numberProblem(cell: string, column: string, min: number, max: number): string | undefined {
  if (!BARE_NUMBER.test(cell)) return `${column}: "${cell}" is not a number (use a point for decimals)`;
  const value = Number(cell);
  return value < min || value > max ? `${column}: must be from ${min} to ${max}` : undefined;
}

function rowProblems(cells: Record<string, string>, seen: Map<string, number>, row: number): string[] {
  const problems: string[] = [];
  const name = cells['name'] ?? '';
  if (!name) problems.push('name: required');
  else if (name.length > 120) problems.push('name: at most 120 characters');
  else {
    const key = name.toLowerCase();
    if (seen.has(key)) problems.push(`name: repeats row ${seen.get(key)}`);
    else seen.set(key, row);
  }
  if (!cells['dk']) problems.push('dk: required');
  else {
    const problem = numberProblem(cells['dk'], 'dk', 1, 100);
    if (problem) problems.push(problem);
  }
  if (cells['df']) {
    const problem = numberProblem(cells['df'], 'df', 0, 1);
    if (problem) problems.push(problem);
  }
  const frequency = cells['referenceFrequency'];
  if (frequency && !(BARE_NUMBER.test(frequency) ? Number(frequency) > 0 && Number(frequency) <= 1e12 : FREQUENCY.test(frequency))) {
    problems.push(`referenceFrequency: "${frequency}" is not a frequency such as 1e9 or 1 GHz`);
  }
  const strength = cells['dielectricStrength'];
  if (strength && !(BARE_NUMBER.test(strength) ? Number(strength) > 0 : FIELD_STRENGTH.test(strength))) {
    problems.push(`dielectricStrength: "${strength}" is not a field strength such as 3e7 or 30 kV/mm`);
  }
  for (const column of ['description', 'notes']) {
    if ((cells[column] ?? '').length > 4000) problems.push(`${column}: at most 4000 characters`);
  }
  return problems;
}

export function previewMaterialsCsv(text: string): CsvPreview {
  const [header = [], ...records] = csvRecords(text);
  const columns = header.map((cell) => cell.trim());
  const fileProblems: string[] = [];
  const unknown = columns.filter((column) => !(MATERIAL_CSV_COLUMNS as readonly string[]).includes(column));
  if (!columns.includes('name') || !columns.includes('dk')) fileProblems.push('The header row must name at least the columns name and dk.');
  if (unknown.length > 0) fileProblems.push(`Unknown columns: ${unknown.join(', ')}. Known: ${MATERIAL_CSV_COLUMNS.join(', ')}.`);
  if (records.length === 0) fileProblems.push('The file has no data rows.');
  if (records.length > MAX_IMPORT_ROWS) fileProblems.push(`The file has ${records.length} rows; at most ${MAX_IMPORT_ROWS} are accepted.`);
  const seen = new Map<string, number>();
  const rows = records.map((record, index) => {
    const cells: Record<string, string> = {};
    columns.forEach((column, position) => (cells[column] = (record[position] ?? '').trim()));
    const problems = rowProblems(cells, seen, index + 1);
    if (record.length !== columns.length) problems.push(`has ${record.length} cells; the header has ${columns.length}`);
    return { row: index + 1, cells, problems };
  });
  return { rows, fileProblems };
}

/** Merges the server's per-row answer (`rows[3].dk: must be number`) into the preview. */
export function withServerProblems(preview: CsvPreview, problems: readonly FieldProblem[]): CsvPreview {
  const rows = preview.rows.map((row) => ({ ...row, problems: [...row.problems] }));
  const fileProblems = [...preview.fileProblems];
  for (const problem of problems) {
    const match = /^rows\[(\d+)\]\.?(.*)$/.exec(problem.field);
    const target = match ? rows.find((row) => row.row === Number(match[1])) : undefined;
    const text = `${match?.[2] ? `${match[2]}: ` : ''}${problem.detail}`;
    if (target) {
      if (!target.problems.includes(text)) target.problems.push(text);
    } else fileProblems.push(`${problem.field ? `${problem.field}: ` : ''}${problem.detail}`);
  }
  return { rows, fileProblems };
}
