import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { StackupLayer } from '@linewright/lines';

/** A line to show on its copper layer. */
export interface DrawnLine {
  label: string;
  layerIndex: number;
  structure: 'single' | 'pair';
}

interface DrawnLayer {
  layer: StackupLayer;
  y: number;
  height: number;
  /** Where its label sits (pushed down so labels never overlap), and its text. */
  labelY: number;
  title: string;
  detail: string;
  lines: DrawnLine[];
  className: string;
}

const STACK_WIDTH = 150;
const LABEL_X = 180;
const VIEW_WIDTH = 520;
/** Drawn scale of the true-scale view [px per metre]: 1.6 mm ≈ 400 px. */
const TRUE_SCALE = 250_000;
/** With the zoom on, no layer is drawn thinner than this [px], so 20 µm of mask and 35 µm of copper can be seen and labelled. */
const ZOOM_MIN_HEIGHT = 18;
const LABEL_SPACING = 26;
const MICROMETRE = 1e-6;

/**
 * The stack, top to bottom, as an SVG. To scale by default; with `isZoomed`,
 * thin layers (copper, mask, thin prepreg) are enlarged to a legible minimum
 * height and the scale bar says so. Each layer is labelled with its name,
 * thickness and material (or Dk/Df), copper layers with the lines on them.
 */
@Component({
  selector: 'lw-stack-drawing',
  template: `
    <svg [attr.viewBox]="'0 0 ' + viewWidth + ' ' + viewHeight()" role="img" [attr.aria-label]="ariaLabel()" preserveAspectRatio="xMinYMin meet">
      @for (drawn of drawnLayers(); track $index) {
        <g [attr.data-layer]="$index">
          <rect [attr.class]="'layer ' + drawn.className" x="0" [attr.y]="drawn.y" [attr.width]="stackWidth" [attr.height]="drawn.height" />
          @for (line of drawn.lines; track line.label; let lineIndex = $index) {
            @for (strip of strips(line, lineIndex); track $index) {
              <rect class="strip" [attr.x]="strip" [attr.y]="drawn.y" width="14" [attr.height]="drawn.height" />
            }
          }
          <line class="leader" [attr.x1]="stackWidth + 4" [attr.y1]="drawn.y + drawn.height / 2" [attr.x2]="labelX - 6" [attr.y2]="drawn.labelY - 4" />
          <text class="title" [attr.x]="labelX" [attr.y]="drawn.labelY">{{ drawn.title }}</text>
          <text class="detail" [attr.x]="labelX" [attr.y]="drawn.labelY + 12">{{ drawn.detail }}</text>
        </g>
      }
      <g class="scale" [attr.transform]="'translate(0,' + (stackHeight() + 22) + ')'">
        <line x1="0" y1="0" [attr.x2]="scaleBar().length" y2="0" />
        <text x="0" y="14">{{ scaleBar().text }}</text>
      </g>
    </svg>
  `,
  styles: `
    :host { display: block; max-width: 640px; }
    svg { width: 100%; height: auto; display: block; font-family: inherit; }
    .layer { stroke: var(--mat-sys-outline); stroke-width: 0.5; }
    .copper { fill: #c27a35; }
    .copper.plane { fill: #a8652a; }
    .core { fill: light-dark(#9fbf8f, #4f6b45); }
    .prepreg { fill: light-dark(#cfe0b8, #6d8460); }
    .coating { fill: light-dark(#4d9b8f, #2f6d64); }
    .strip { fill: light-dark(#6a3b12, #f0c08a); }
    .leader { stroke: var(--mat-sys-outline); stroke-width: 0.6; }
    .title { font-size: 12px; font-weight: 600; fill: var(--mat-sys-on-surface); }
    .detail { font-size: 10.5px; fill: var(--mat-sys-on-surface-variant); }
    .scale line { stroke: var(--mat-sys-on-surface); stroke-width: 2; }
    .scale text { font-size: 10.5px; fill: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StackDrawing {
  readonly layers = input.required<readonly StackupLayer[]>();
  readonly lines = input<readonly DrawnLine[]>([]);
  readonly isZoomed = input(false);

  protected readonly stackWidth = STACK_WIDTH;
  protected readonly labelX = LABEL_X;
  protected readonly viewWidth = VIEW_WIDTH;

  protected readonly drawnLayers = computed<DrawnLayer[]>(() => {
    let y = 0;
    let nextLabel = 12;
    return this.layers().map((layer, index) => {
      const height = this.heightOf(layer.thickness);
      const lines = this.lines().filter((line) => line.layerIndex === index);
      const labelY = Math.max(y + height / 2 + 4, nextLabel);
      nextLabel = labelY + LABEL_SPACING;
      const drawn: DrawnLayer = { layer, y, height, labelY, title: `${layer.name} · ${thickness(layer.thickness)}`, detail: detailOf(layer, lines), lines, className: classOf(layer) };
      y += height;
      return drawn;
    });
  });

  protected readonly stackHeight = computed(() => this.layers().reduce((sum, layer) => sum + this.heightOf(layer.thickness), 0));
  protected readonly viewHeight = computed(() => Math.max(this.stackHeight() + 44, (this.drawnLayers().at(-1)?.labelY ?? 0) + 24));

  /** A 0.1 mm bar at the true scale; zoomed, it states that thin layers are enlarged. */
  protected readonly scaleBar = computed(() => ({
    length: 0.1e-3 * TRUE_SCALE,
    text: this.isZoomed() ? `0.1 mm (thin layers enlarged to ${ZOOM_MIN_HEIGHT} px)` : '0.1 mm, drawn to scale',
  }));

  protected readonly ariaLabel = computed(() => `Stack of ${this.layers().length} layers, ${thickness(this.layers().reduce((sum, layer) => sum + layer.thickness, 0))} overall`);

  /** x positions of the strip(s) of the line'th line on a layer: single lines one strip, pairs two. */
  protected strips(line: DrawnLine, lineIndex: number): number[] {
    const x = 16 + lineIndex * 40;
    return line.structure === 'pair' ? [x, x + 20] : [x];
  }

  private heightOf(layerThickness: number): number {
    const scaled = layerThickness * TRUE_SCALE;
    return this.isZoomed() ? Math.max(scaled, ZOOM_MIN_HEIGHT) : scaled;
  }
}

function thickness(metres: number): string {
  return metres >= 1e-3 ? `${(metres * 1e3).toFixed(2)} mm` : `${Number((metres / MICROMETRE).toPrecision(3))} µm`;
}

function classOf(layer: StackupLayer): string {
  return layer.type === 'copper' ? `copper ${layer.role}` : layer.kind;
}

function detailOf(layer: StackupLayer, lines: readonly DrawnLine[]): string {
  if (layer.type === 'dielectric') return `${layer.kind}, ${layer.material ?? 'own values'}, Dk ${layer.relativePermittivity}, Df ${layer.lossTangent}`;
  const role = layer.role === 'plane' ? 'plane' : layer.role === 'mixed' ? 'signal and pour' : 'signal';
  return lines.length > 0 ? `${role}: ${lines.map((line) => line.label).join(', ')}` : role;
}
