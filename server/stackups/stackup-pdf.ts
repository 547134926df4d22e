/**
 * The impedance table as one landscape A4 page to attach to a fabrication
 * drawing: the lines with their targets and computed values, the stack they
 * are derived from, and the estimate caution. pdfkit with the fonts the app
 * ships (Inter for text, IBM Plex Mono for figures), read as WOFF. Their Latin
 * subsets have no Greek letters, so the page writes "ohm" and "Dk".
 */
import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import { MILLIMETRE, PICOSECONDS_PER_MILLIMETRE } from './stackup-csv';
import type { StackupTable } from './stackup-table';

const FONT_DIR = fileURLToPath(new URL('../../node_modules/@fontsource/', import.meta.url));
const FONTS = {
  text: `${FONT_DIR}inter/files/inter-latin-400-normal.woff`,
  bold: `${FONT_DIR}inter/files/inter-latin-600-normal.woff`,
  figures: `${FONT_DIR}ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff`,
};
const PAGE = { width: 841.89, height: 595.28, margin: 36 };
/** Rows that fit one page at the smallest legible size; more are named in a footnote (the CSV has them all). */
export const MAX_PDF_ROWS = 22;
const MICROMETRE = 1e-6;
const FOOTER_TOP = PAGE.height - PAGE.margin - 32;
/** Drawn no thinner than this [pt], so mask and copper show; the drawing says it is not to scale. */
const MIN_LAYER_HEIGHT = 5;
const COLOURS = { copper: '#c27a35', core: '#9fbf8f', prepreg: '#cfe0b8', coating: '#4d9b8f' };

interface Column {
  title: string;
  width: number;
  value: (row: StackupTable['rows'][number]) => string;
  isFigure?: boolean;
}

const COLUMNS: Column[] = [
  { title: 'Line', width: 150, value: (row) => row.label },
  { title: 'Layer', width: 70, value: (row) => row.layerName },
  { title: 'Type', width: 48, value: (row) => (row.structure === 'pair' ? 'diff pair' : 'single') },
  { title: 'Target ohm', width: 62, value: (row) => `${row.targetImpedance}±${(row.tolerance * 100).toFixed(0)}%`, isFigure: true },
  { title: 'Width mm', width: 50, value: (row) => (row.width / MILLIMETRE).toFixed(4), isFigure: true },
  { title: 'Gap mm', width: 50, value: (row) => (row.gap === null ? '–' : (row.gap / MILLIMETRE).toFixed(4)), isFigure: true },
  { title: 'Reference', width: 95, value: (row) => row.referenceLayers.join(' / ') },
  { title: 'Computed ohm', width: 64, value: (row) => row.impedance.toFixed(2), isFigure: true },
  { title: 'Delay ps/mm', width: 58, value: (row) => (row.delayPerMeter / PICOSECONDS_PER_MILLIMETRE).toFixed(3), isFigure: true },
  { title: 'Spread ohm', width: 76, value: (row) => `${row.spreadLow.toFixed(1)}–${row.spreadHigh.toFixed(1)}`, isFigure: true },
  { title: 'Meets', width: 46, value: (row) => (row.isWithinTolerance ? 'yes' : 'NO') },
];

export function tablePdf(table: StackupTable, generatedAt = new Date()): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', layout: 'landscape', margin: PAGE.margin, info: { Title: `Impedance table: ${table.stackup.name}`, Creator: 'Linewright' } });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont('text', FONTS.text);
  doc.registerFont('bold', FONTS.bold);
  doc.registerFont('figures', FONTS.figures);

  const left = PAGE.margin;
  doc.font('bold').fontSize(15).text(`Controlled-impedance table: ${table.stackup.name}`, left, PAGE.margin, { lineBreak: false });
  doc.font('text').fontSize(8.5).fillColor('#444444')
    .text(`Stackup version ${table.stackup.version} (${table.stackup.state}), generated ${generatedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC by Linewright.`, left, PAGE.margin + 20, { lineBreak: false });

  let y = PAGE.margin + 44;
  y = drawLines(doc, table, y);
  y = drawStack(doc, table, y + 16);
  drawSection(doc, table, y + 14, FOOTER_TOP - 14);
  drawFooter(doc, table);
  doc.end();
  return done;
}

function drawLines(doc: PDFKit.PDFDocument, table: StackupTable, top: number): number {
  const rows = table.rows.slice(0, MAX_PDF_ROWS);
  let x = PAGE.margin;
  doc.fillColor('#000000').font('bold').fontSize(8);
  for (const column of COLUMNS) {
    doc.text(column.title, x, top, { width: column.width - 4, lineBreak: false });
    x += column.width;
  }
  let y = top + 13;
  doc.moveTo(PAGE.margin, y - 3).lineTo(PAGE.width - PAGE.margin, y - 3).lineWidth(0.6).strokeColor('#000000').stroke();
  for (const row of rows) {
    x = PAGE.margin;
    for (const column of COLUMNS) {
      // fontkit fails on the space glyph of IBM Plex Mono's WOFF (RangeError in its glyph decoder), so figures carry no spaces.
      const value = column.isFigure ? column.value(row).replaceAll(' ', '') : column.value(row);
      doc.font(column.isFigure ? 'figures' : 'text').fontSize(8).text(value, x, y, { width: column.width - 4, lineBreak: false, ellipsis: true });
      x += column.width;
    }
    y += 12.5;
  }
  if (rows.length === 0) {
    doc.font('text').fontSize(8).text('No lines are placed on this stackup yet.', PAGE.margin, y, { lineBreak: false });
    y += 12.5;
  }
  if (table.rows.length > rows.length) {
    doc.font('text').fontSize(7.5).text(`${table.rows.length - rows.length} more lines are in the CSV export of this table.`, PAGE.margin, y, { lineBreak: false });
    y += 11;
  }
  return y;
}

/** The layers in two columns: name, kind, thickness in µm, Dk/Df or copper role, material. */
function drawStack(doc: PDFKit.PDFDocument, table: StackupTable, top: number): number {
  doc.font('bold').fontSize(9).text('Stack, top to bottom', PAGE.margin, top, { lineBreak: false });
  const half = Math.ceil(table.layers.length / 2);
  const columnWidth = (PAGE.width - 2 * PAGE.margin) / 2;
  let lowest = top + 14;
  table.layers.forEach((layer, index) => {
    const x = PAGE.margin + (index < half ? 0 : columnWidth);
    const y = top + 14 + (index % half) * 11;
    const thickness = `${(layer.thickness / MICROMETRE).toFixed(1)}µm`;
    const detail = layer.type === 'copper' ? `copper, ${layer.role}` : `${layer.kind}, Dk ${layer.relativePermittivity}, Df ${layer.lossTangent}${layer.material ? `, ${layer.material}` : ''}`;
    doc.font('text').fontSize(7.5).text(layer.name, x, y, { width: 90, lineBreak: false, ellipsis: true });
    doc.font('figures').fontSize(7.5).text(thickness, x + 92, y, { width: 60, lineBreak: false });
    doc.font('text').fontSize(7.5).text(detail, x + 154, y, { width: columnWidth - 160, lineBreak: false, ellipsis: true });
    lowest = Math.max(lowest, y + 11);
  });
  return lowest;
}

/** A schematic cross-section of the stack in the space left: thicknesses in proportion, thin layers enlarged; copper layers name their lines. */
function drawSection(doc: PDFKit.PDFDocument, table: StackupTable, top: number, bottom: number): void {
  const total = table.layers.reduce((sum, layer) => sum + layer.thickness, 0);
  const available = bottom - top - 14;
  if (available < 80 || table.layers.length === 0) return;
  const scale = (available - MIN_LAYER_HEIGHT * table.layers.length) / total;
  doc.font('bold').fontSize(9).fillColor('#000000').text('Cross-section (thin layers enlarged, not to scale)', PAGE.margin, top, { lineBreak: false });
  let y = top + 14;
  table.layers.forEach((layer, index) => {
    const height = MIN_LAYER_HEIGHT + layer.thickness * scale;
    const colour = layer.type === 'copper' ? COLOURS.copper : COLOURS[layer.kind];
    doc.rect(PAGE.margin, y, 200, height).fillAndStroke(colour, '#555555');
    const lines = table.rows.filter((row) => row.layerIndex === index).map((row) => row.label);
    if (height >= 7) {
      const label = `${layer.name}${lines.length > 0 ? ` — ${lines.join(', ')}` : ''}`;
      doc.fillColor('#000000').font('text').fontSize(Math.min(7.5, height - 1)).text(label, PAGE.margin + 208, y + (height - Math.min(7.5, height - 1)) / 2 - 1, { width: 520, lineBreak: false, ellipsis: true });
    }
    y += height;
  });
}

function drawFooter(doc: PDFKit.PDFDocument, table: StackupTable): void {
  const { width, dielectricThickness, relativePermittivity } = table.spreads;
  const percent = (fraction: number) => `±${(fraction * 100).toFixed(0)} %`;
  const warned = table.rows.filter((row) => row.warnings.length > 0).length;
  const lines = [
    `Caution: ${table.note}`,
    `Spread: worst corners for width ${percent(width)}, dielectric thickness ${percent(dielectricThickness)}, Dk ${percent(relativePermittivity)} (common fabrication tolerances, no source).` +
      (warned > 0 ? ` ${warned} line(s) carry model warnings; see the table in Linewright.` : ''),
  ];
  const y = FOOTER_TOP + 6;
  doc.moveTo(PAGE.margin, y - 6).lineTo(PAGE.width - PAGE.margin, y - 6).lineWidth(0.4).strokeColor('#888888').stroke();
  doc.font('bold').fontSize(8).fillColor('#000000').text(lines[0], PAGE.margin, y, { width: PAGE.width - 2 * PAGE.margin, lineBreak: false, ellipsis: true });
  doc.font('text').fontSize(7.5).fillColor('#333333').text(lines[1], PAGE.margin, y + 12, { width: PAGE.width - 2 * PAGE.margin, lineBreak: false, ellipsis: true });
}
