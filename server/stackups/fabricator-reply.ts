/**
 * The fabricator's reply: the exported table with their adjusted widths,
 * gaps and dielectric heights and their own computed impedance. Each row is
 * set beside Linewright's: the differences, Linewright's impedance at their
 * width and gap on this stack, and whether either is outside the tolerance.
 * Every row is checked first; any problem answers 400 naming `rows[N].column`
 * (N counts data rows from 1) and nothing is stored.
 */
import { ESTIMATE_NOTE, LineInputError, calculate, lineGeometryFor, type Stackup } from '@linewright/lines';
import type { FieldProblem } from '../errors';
import { csvRows, MILLIMETRE, numberCell, rowProblems } from './stackup-csv';
import type { StackupTable, StackupTableRow } from './stackup-table';

export interface ReplyGeometry {
  width: number;
  gap: number | null;
  heightAbove: number | null;
  heightBelow: number | null;
  impedance: number;
}

export interface ReplyComparisonRow {
  /** Data row in the file, from 1. */
  row: number;
  label: string;
  placementId: string;
  layerName: string;
  structure: 'single' | 'pair';
  targetImpedance: number;
  tolerance: number;
  ours: ReplyGeometry;
  theirs: ReplyGeometry;
  /** Theirs minus ours, SI; null where they gave no value. */
  differences: { width: number; gap: number | null; heightAbove: number | null; heightBelow: number | null; impedance: number; impedancePercent: number };
  /** Linewright's impedance at their width and gap on this stack (their heights are not applied). */
  linewrightAtTheirGeometry: number;
  isTheirsWithinTolerance: boolean;
  isOursAtTheirGeometryWithinTolerance: boolean;
  isOutOfTolerance: boolean;
}

export interface ReplyReport {
  rows: ReplyComparisonRow[];
  /** Lines of the table the reply does not mention. */
  missing: string[];
  outOfTolerance: number;
  note: string;
}

const REQUIRED_COLUMNS = ['label', 'width_mm', 'impedance_ohm'];

export function compareReply(csv: Buffer | undefined, table: StackupTable, stackup: Stackup): ReplyReport {
  const rows = csvRows(csv);
  const problems: FieldProblem[] = [];
  for (const column of REQUIRED_COLUMNS) if (!(column in rows[0])) problems.push({ field: `columns.${column}`, detail: 'is a required column' });
  if (problems.length > 0) throw rowProblems(problems, rows.length);

  const byLabel = new Map(table.rows.map((row) => [row.label.toLowerCase(), row]));
  const seen = new Map<string, number>();
  const compared: ReplyComparisonRow[] = [];
  rows.forEach((cells, index) => {
    const number = index + 1;
    const path = `rows[${number}]`;
    const ours = byLabel.get((cells['label'] ?? '').toLowerCase());
    if (!ours) {
      problems.push({ field: `${path}.label`, detail: `"${cells['label'] ?? ''}" is not a line of this stackup` });
      return;
    }
    if (seen.has(ours.label)) problems.push({ field: `${path}.label`, detail: `repeats rows[${seen.get(ours.label)}]` });
    seen.set(ours.label, number);
    const before = problems.length;
    const theirs = replyGeometry(cells, path, ours, problems);
    if (problems.length > before || !theirs) return;
    const linewright = impedanceAt(stackup, ours, theirs, path, problems);
    if (linewright === undefined) return;
    compared.push(comparison(number, ours, theirs, linewright));
  });
  if (problems.length > 0) throw rowProblems(problems, rows.length);
  return {
    rows: compared,
    missing: table.rows.filter((row) => !seen.has(row.label)).map((row) => row.label),
    outOfTolerance: compared.filter((row) => row.isOutOfTolerance).length,
    note: ESTIMATE_NOTE,
  };
}

function replyGeometry(cells: Record<string, string>, path: string, ours: StackupTableRow, problems: FieldProblem[]): ReplyGeometry | undefined {
  const isPair = ours.structure === 'pair';
  const width = numberCell(cells['width_mm'], `${path}.width_mm`, MILLIMETRE, problems, { isLength: true, isRequired: true });
  const gap = numberCell(cells['gap_mm'], `${path}.gap_mm`, MILLIMETRE, problems, { isLength: true, isRequired: isPair });
  const heightAbove = numberCell(cells['height_above_mm'], `${path}.height_above_mm`, MILLIMETRE, problems, { isLength: true });
  const heightBelow = numberCell(cells['height_below_mm'], `${path}.height_below_mm`, MILLIMETRE, problems, { isLength: true });
  const impedance = numberCell(cells['impedance_ohm'], `${path}.impedance_ohm`, 1, problems, { isRequired: true });
  for (const [column, value] of [['width_mm', width], ['gap_mm', gap], ['impedance_ohm', impedance]] as const) {
    if (value !== undefined && !(value > 0)) problems.push({ field: `${path}.${column}`, detail: 'must be greater than zero' });
  }
  if (width === undefined || impedance === undefined) return undefined;
  return { width, gap: isPair ? (gap ?? null) : null, heightAbove: heightAbove ?? null, heightBelow: heightBelow ?? null, impedance };
}

function impedanceAt(stackup: Stackup, ours: StackupTableRow, theirs: ReplyGeometry, path: string, problems: FieldProblem[]): number | undefined {
  try {
    const geometry = lineGeometryFor(stackup, ours.layerIndex, ours.structure, { width: theirs.width, gap: theirs.gap ?? undefined });
    const result = calculate(geometry.spec);
    return ours.structure === 'pair' ? result.zDiff! : result.z0;
  } catch (error) {
    // Their geometry may be impossible on this stack (e.g. a gap of zero): that row is reported, not the whole upload failed.
    if (!(error instanceof LineInputError)) throw error;
    problems.push({ field: `${path}.${error.field === 'gap' ? 'gap_mm' : 'width_mm'}`, detail: error.rule });
    return undefined;
  }
}

function comparison(row: number, ours: StackupTableRow, theirs: ReplyGeometry, linewright: number): ReplyComparisonRow {
  const band = ours.targetImpedance * ours.tolerance;
  const isWithin = (impedance: number) => Math.abs(impedance - ours.targetImpedance) <= band;
  const difference = (their: number | null, our: number | null) => (their === null || our === null ? null : their - our);
  const isTheirsWithinTolerance = isWithin(theirs.impedance);
  const isOursAtTheirGeometryWithinTolerance = isWithin(linewright);
  return {
    row,
    label: ours.label,
    placementId: ours.placementId,
    layerName: ours.layerName,
    structure: ours.structure,
    targetImpedance: ours.targetImpedance,
    tolerance: ours.tolerance,
    ours: { width: ours.width, gap: ours.gap, heightAbove: ours.heightAbove, heightBelow: ours.heightBelow, impedance: ours.impedance },
    theirs,
    differences: {
      width: theirs.width - ours.width,
      gap: difference(theirs.gap, ours.gap),
      heightAbove: difference(theirs.heightAbove, ours.heightAbove),
      heightBelow: difference(theirs.heightBelow, ours.heightBelow),
      impedance: theirs.impedance - ours.impedance,
      impedancePercent: ((theirs.impedance - ours.impedance) / ours.impedance) * 100,
    },
    linewrightAtTheirGeometry: linewright,
    isTheirsWithinTolerance,
    isOursAtTheirGeometryWithinTolerance,
    isOutOfTolerance: !isTheirsWithinTolerance || !isOursAtTheirGeometryWithinTolerance,
  };
}
