import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { LineResult } from '@linewright/lines';
import { detailRows, headlineRows } from './readout-rows';

/** The computed figures of one line, its method and any validity warnings beside them. */
@Component({
  selector: 'lw-line-readout',
  imports: [MatIconModule],
  template: `
    <div class="headline">
      @for (row of headline(); track row.id) {
        <div class="figure" [attr.data-figure]="row.id">
          <span class="label">{{ row.label }}</span>
          <span class="value lw-number">{{ row.value }}</span>
        </div>
      }
    </div>
    @if (result().warnings.length > 0) {
      <ul class="warnings" aria-label="Warnings">
        @for (warning of result().warnings; track $index) {
          <li><mat-icon aria-hidden="true">warning</mat-icon><span>{{ warning }}</span></li>
        }
      </ul>
    }
    <dl class="details">
      @for (row of details(); track row.id) {
        <div class="row" [attr.data-figure]="row.id">
          <dt>{{ row.label }}</dt>
          <dd class="lw-number">{{ row.value }}@if (row.alternate) {<span class="alternate">{{ row.alternate }}</span>}</dd>
        </div>
      }
    </dl>
    <p class="method"><span class="method-name">{{ result().method.name }}</span> — {{ result().method.citation }}</p>
  `,
  styleUrl: './line-readout.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineReadout {
  readonly result = input.required<LineResult>();
  readonly isCoupled = input(false);

  protected readonly headline = computed(() => headlineRows(this.result(), this.isCoupled()));
  protected readonly details = computed(() => detailRows(this.result(), this.isCoupled()));
}
