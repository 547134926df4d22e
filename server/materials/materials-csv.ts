/**
 * Materials as CSV: the import checks every row against the MaterialInput
 * schema and the same rules as the API, reports every problem by row
 * (`rows[3].dk`, rows counted from 1 after the header), and commits all rows
 * or none. The export writes the same columns, so an export imports again.
 */
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { LineInputError } from '@linewright/lines';
import type { ValidateFunction } from 'ajv';
import { fieldProblems } from '../api-contract';
import { Problem, type FieldProblem } from '../errors';
import type { Actor } from '../auth/principal';
import type { Material, MaterialValues } from './materials-repository';
import { materialValues, type MaterialCatalog, type MaterialInput } from './materials-service';

export const CSV_COLUMNS = ['name', 'description', 'dk', 'df', 'referenceFrequency', 'dielectricStrength', 'notes'] as const;
const TEXT_COLUMNS = new Set(['name', 'description', 'notes']);
/** A bare number; in quantity columns anything else is a unit string such as "1 GHz". */
const BARE_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
/** More rows than this is not a team's material list; refuse before doing work per row. */
export const MAX_IMPORT_ROWS = 1000;

export interface ImportReport {
  created: number;
  items: Material[];
}

function rowsOf(csv: Buffer): Record<string, string>[] {
  try {
    return parse(csv, { columns: true, skip_empty_lines: true, trim: true, bom: true, max_record_size: 64 * 1024 });
  } catch (error) {
    // csv-parse throws for malformed text (unclosed quote, ragged row); that is the client's mistake, not ours.
    throw Problem.badRequest(`The file is not readable CSV: ${(error as Error).message}`, [{ field: 'file', detail: 'is not readable CSV' }]);
  }
}

/**
 * A CSV row as the JSON the API would have received: an empty cell is absent,
 * a number is a number; other text stays text, so the schema names a "4,2" in
 * the dk column as a wrong type instead of it becoming NaN.
 */
function inputOf(row: Record<string, string>): Record<string, unknown> {
  const input: Record<string, unknown> = {};
  for (const [column, cell] of Object.entries(row)) {
    if (cell === '') continue;
    input[column] = !TEXT_COLUMNS.has(column) && BARE_NUMBER.test(cell) ? Number(cell) : cell;
  }
  return input;
}

export async function importMaterials(catalog: MaterialCatalog, schema: ValidateFunction, actor: Actor, csv: Buffer | undefined): Promise<ImportReport> {
  if (!csv) throw Problem.badRequest('Send the CSV as the multipart field "file".', [{ field: 'file', detail: 'is required' }]);
  const rows = rowsOf(csv);
  if (rows.length === 0) throw Problem.badRequest('The CSV has no data rows.', [{ field: 'file', detail: 'has no data rows' }]);
  if (rows.length > MAX_IMPORT_ROWS) throw Problem.badRequest(`The CSV has ${rows.length} rows; at most ${MAX_IMPORT_ROWS} are accepted.`, [{ field: 'file', detail: `has more than ${MAX_IMPORT_ROWS} rows` }]);

  const problems: FieldProblem[] = [];
  const prepared: MaterialValues[] = [];
  const seen = new Map<string, number>();
  const existing = new Set((await catalog.materials.names()).map((name) => name.toLowerCase()));
  rows.forEach((row, index) => {
    const path = `rows[${index + 1}]`;
    const input = inputOf(row);
    if (!schema(input)) {
      problems.push(...fieldProblems(schema.errors, path));
      return;
    }
    try {
      const values = materialValues(input as unknown as MaterialInput, `${path}.`);
      const key = values.name!.toLowerCase();
      if (existing.has(key)) problems.push({ field: `${path}.name`, detail: 'is already in the catalog' });
      else if (seen.has(key)) problems.push({ field: `${path}.name`, detail: `repeats rows[${seen.get(key)}]` });
      seen.set(key, index + 1);
      prepared.push({ description: null, df: 0, referenceFrequency: 1e9, dkDfTable: null, dielectricStrength: null, notes: null, isTypical: false, ...values } as MaterialValues);
    } catch (error) {
      // A unit string that does not parse belongs in the row report, not as the whole answer.
      if (!(error instanceof LineInputError)) throw error;
      problems.push({ field: error.field, detail: error.rule });
    }
  });
  if (problems.length > 0) {
    throw Problem.badRequest(`${new Set(problems.map((problem) => problem.field.split('.')[0])).size} of ${rows.length} rows have problems; nothing was imported.`, problems);
  }
  const items = await catalog.createAll(actor, prepared);
  return { created: items.length, items };
}

export function exportMaterials(materials: Material[]): string {
  return stringify(
    materials.map((material) => CSV_COLUMNS.map((column) => material[column] ?? '')),
    { header: true, columns: [...CSV_COLUMNS] },
  );
}
