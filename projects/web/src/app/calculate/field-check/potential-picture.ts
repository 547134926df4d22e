import { ChangeDetectionStrategy, Component, ElementRef, effect, input, viewChild } from '@angular/core';
import type { PotentialMap } from '@linewright/lines';

/** Potential bands drawn: each colour step is one equipotential interval. */
const BANDS = 12;
/** From the ground potential (0) to the driven conductor's (1), our own ramp. */
const RAMP: readonly [number, number, number][] = [
  [24, 44, 92],
  [29, 138, 150],
  [236, 214, 120],
  [194, 122, 53],
];

function colourAt(fraction: number): [number, number, number] {
  const scaled = Math.min(Math.max(fraction, 0), 1) * (RAMP.length - 1);
  const index = Math.min(Math.floor(scaled), RAMP.length - 2);
  const t = scaled - index;
  const [a, b] = [RAMP[index], RAMP[index + 1]];
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
}

/**
 * The solved potential as banded colour, one band per equipotential interval,
 * so the field's shape (and its fringing) can be read at a glance.
 */
@Component({
  selector: 'lw-potential-picture',
  template: `
    <canvas #canvas role="img" [attr.aria-label]="'Potential in the cross-section: ' + (map()?.excitation ?? '')"></canvas>
    <p class="legend"><span class="ramp" aria-hidden="true"></span><span>0 V (ground)</span><span>→</span><span>{{ map()?.excitation }}</span></p>
  `,
  styles: `
    :host { display: block; }
    canvas { width: 100%; max-width: 560px; max-height: 320px; object-fit: contain; border-radius: 10px; display: block; margin: 0 auto; }
    .legend { display: flex; gap: 8px; align-items: center; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); margin: 6px 0 0; }
    .ramp { width: 80px; height: 10px; border-radius: 5px; background: linear-gradient(90deg, rgb(24,44,92), rgb(29,138,150), rgb(236,214,120), rgb(194,122,53)); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PotentialPicture {
  readonly map = input<PotentialMap | undefined>();
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');

  constructor() {
    effect(() => {
      const map = this.map();
      const canvas = this.canvas().nativeElement;
      if (!map) return;
      const columns = map.x.length;
      const rows = map.y.length;
      canvas.width = columns;
      canvas.height = rows;
      const context = canvas.getContext('2d');
      if (!context) return;
      const image = context.createImageData(columns, rows);
      const peak = Math.max(...map.values.map(Math.abs)) || 1;
      for (let j = 0; j < rows; j++) {
        for (let i = 0; i < columns; i++) {
          const value = map.values[j * columns + i] / peak;
          // Odd-mode pictures run from −1 to 1; fold them onto the same ramp around zero.
          const banded = Math.round(Math.abs(value) * BANDS) / BANDS;
          const [r, g, b] = colourAt(banded);
          const offset = ((rows - 1 - j) * columns + i) * 4;
          image.data.set([r, g, b, 255], offset);
        }
      }
      context.putImageData(image, 0, 0);
    });
  }
}
