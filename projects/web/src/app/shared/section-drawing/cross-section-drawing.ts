import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatSliderModule } from '@angular/material/slider';
import { crossSectionFromSpec, fromSi, type CrossSectionOptions, type LineSpec, type TableUnit } from '@linewright/lines';
import { trimmed } from '../engineering-format';
import { sectionLayout, type Box, type Dimension, type Primitive } from './section-layout';

const WIDTH = 480;
/** The drawing's height follows the section's proportions within these bounds [px]. */
const MIN_HEIGHT = 170;
const MAX_HEIGHT = 300;
const PADDING = 30;
const UNIT_LABEL: Partial<Record<TableUnit, string>> = { um: 'µm' };

interface DrawnPrimitive {
  kind: 'polygon' | 'circle';
  paint: string;
  points?: string;
  cx?: number;
  cy?: number;
  r?: number;
}

interface DrawnDimension {
  field: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  labelX: number;
  labelY: number;
  anchor: 'start' | 'middle' | 'end';
  text: string;
}

/**
 * The line's cross-section to scale (the same geometry the field solver uses),
 * with each dimension labelled by its field and value. A zoom slider magnifies
 * around the signal conductors for thin layers; the scale stays uniform.
 */
@Component({
  selector: 'lw-cross-section-drawing',
  imports: [MatSliderModule],
  templateUrl: './cross-section-drawing.html',
  styleUrl: './cross-section-drawing.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CrossSectionDrawing {
  readonly spec = input<LineSpec | undefined>();
  /** Departures from the idealised section (etch, coating, εr above), as the field solver sees them. */
  readonly section = input<CrossSectionOptions>({});
  /** The unit dimension labels are shown in. */
  readonly unit = input<TableUnit>('mm');
  protected readonly zoom = signal(1);
  protected readonly width = WIDTH;
  protected readonly height = computed(() => {
    const view = this.layout()?.view;
    if (!view) return MIN_HEIGHT;
    const natural = ((WIDTH - 2 * PADDING) * (view.top - view.bottom)) / (view.right - view.left) + 2 * PADDING;
    return Math.round(Math.min(MAX_HEIGHT, Math.max(MIN_HEIGHT, natural)));
  });

  private readonly layout = computed(() => {
    const spec = this.spec();
    if (!spec) return undefined;
    try {
      return sectionLayout(crossSectionFromSpec(spec, this.section()), spec);
    } catch {
      // An impossible spec (or section option) has no shape to draw; the form already says what is wrong.
      return undefined;
    }
  });

  private readonly view = computed<Box | undefined>(() => {
    const layout = this.layout();
    if (!layout) return undefined;
    const zoom = this.zoom();
    const { view } = layout;
    const signal = layout.primitives.filter((p) => p.paint === 'signal').flatMap(pointsOf);
    const cx = signal.length ? signal.reduce((sum, [x]) => sum + x, 0) / signal.length : (view.left + view.right) / 2;
    const cy = signal.length ? signal.reduce((sum, [, y]) => sum + y, 0) / signal.length : (view.bottom + view.top) / 2;
    const halfWidth = (view.right - view.left) / 2 / zoom;
    const halfHeight = (view.top - view.bottom) / 2 / zoom;
    const centreX = zoom === 1 ? (view.left + view.right) / 2 : cx;
    const centreY = zoom === 1 ? (view.bottom + view.top) / 2 : cy;
    return { left: centreX - halfWidth, right: centreX + halfWidth, bottom: centreY - halfHeight, top: centreY + halfHeight };
  });

  /** Metres → SVG pixels, one scale for both axes, y pointing up. */
  private readonly transform = computed(() => {
    const view = this.view();
    if (!view) return undefined;
    const height = this.height();
    const scale = Math.min((WIDTH - 2 * PADDING) / (view.right - view.left), (height - 2 * PADDING) / (view.top - view.bottom));
    const offsetX = (WIDTH - scale * (view.right - view.left)) / 2;
    const offsetY = (height - scale * (view.top - view.bottom)) / 2;
    return (x: number, y: number): [number, number] => [offsetX + (x - view.left) * scale, height - offsetY - (y - view.bottom) * scale];
  });

  protected readonly primitives = computed<DrawnPrimitive[]>(() => {
    const layout = this.layout();
    const to = this.transform();
    if (!layout || !to) return [];
    return layout.primitives.map((p) => drawPrimitive(p, to));
  });

  protected readonly dimensions = computed<DrawnDimension[]>(() => {
    const layout = this.layout();
    const to = this.transform();
    if (!layout || !to) return [];
    const unit = this.unit();
    return layout.dimensions.map((dimension) => drawDimension(dimension, to, `${dimension.field} ${trimmed(fromSi(dimension.value, unit), 3)} ${UNIT_LABEL[unit] ?? unit}`));
  });

  protected readonly description = computed(() =>
    this.dimensions().map((dimension) => dimension.text).join(', '),
  );

  protected readonly zoomLabel = (value: number) => `${value}×`;

  protected setZoom(value: number): void {
    this.zoom.set(value);
  }
}

function pointsOf(primitive: Primitive): [number, number][] {
  return primitive.type === 'circle' ? [[primitive.cx, primitive.cy]] : primitive.points;
}

function drawPrimitive(primitive: Primitive, to: (x: number, y: number) => [number, number]): DrawnPrimitive {
  if (primitive.type === 'circle') {
    const [cx, cy] = to(primitive.cx, primitive.cy);
    const [edge] = to(primitive.cx + primitive.r, primitive.cy);
    return { kind: 'circle', paint: primitive.paint, cx, cy, r: Math.max(edge - cx, 1) };
  }
  return { kind: 'polygon', paint: primitive.paint, points: primitive.points.map(([x, y]) => to(x, y).map((v) => v.toFixed(1)).join(',')).join(' ') };
}

const LABEL_OFFSET = 14;

function drawDimension(dimension: Dimension, to: (x: number, y: number) => [number, number], text: string): DrawnDimension {
  const [x1, y1] = to(...dimension.from);
  const [x2, y2] = to(...dimension.to);
  const shift = { above: [0, -LABEL_OFFSET], below: [0, LABEL_OFFSET], left: [-LABEL_OFFSET, 0], right: [LABEL_OFFSET, 0] }[dimension.side];
  const vertical = dimension.side === 'left' || dimension.side === 'right';
  const offsetLine = vertical ? [shift[0] / 2, 0] : [0, shift[1] / 2];
  return {
    field: dimension.field,
    x1: x1 + offsetLine[0],
    y1: y1 + offsetLine[1],
    x2: x2 + offsetLine[0],
    y2: y2 + offsetLine[1],
    labelX: (x1 + x2) / 2 + shift[0],
    labelY: (y1 + y2) / 2 + shift[1] + (vertical ? 4 : dimension.side === 'below' ? 8 : 0),
    anchor: dimension.side === 'left' ? 'end' : dimension.side === 'right' ? 'start' : 'middle',
    text,
  };
}
