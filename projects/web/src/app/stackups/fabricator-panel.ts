import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { CsvPicker } from './csv-picker';
import { UploadedReport, UploadProblems } from './uploaded-report';
import { StackupsApi } from './stackups-api';
import type { ReplyReport, ReplyRow } from './stackup-types';

const MILLIMETRE = 1e-3;

/**
 * The fabricator's reply: their copy of the exported CSV with adjusted
 * widths, gaps and heights and their own impedance. Row by row beside ours,
 * with the rows outside tolerance flagged; a malformed file lists its
 * problems per row and nothing is stored.
 */
@Component({
  selector: 'lw-fabricator-panel',
  imports: [MatIconModule, CsvPicker, UploadProblems],
  template: `
    <div class="lw-actions">
      <lw-csv-picker label="Upload the fabricator's CSV" name="reply" [disabled]="!canUpload()" (picked)="uploads.upload($event)" />
      <span class="hint">The exported table's columns; their widths, gaps, heights and computed impedance.</span>
    </div>
    <lw-upload-problems [problems]="uploads.problems()" />
    @if (report(); as report) {
      <p class="summary">{{ report.rows.length }} rows compared, <strong>{{ report.outOfTolerance }}</strong> outside tolerance@if (report.missing.length > 0) {; not in the reply: {{ report.missing.join(', ') }}}.</p>
      <div class="lw-table-wrap">
        <table class="lw-data-table comparison" aria-label="Fabricator's values against Linewright's">
          <thead><tr><th scope="col">Line</th><th scope="col">Target</th><th scope="col" class="n">Width ours → theirs mm</th><th scope="col" class="n">Gap ours → theirs mm</th>
            <th scope="col" class="n">Theirs Ω</th><th scope="col" class="n">Ours Ω</th><th scope="col" class="n">Ours at their width Ω</th><th scope="col">Verdict</th></tr></thead>
          <tbody>
            @for (row of report.rows; track row.row) {
              <tr [class.is-out]="row.isOutOfTolerance" [attr.data-line]="row.label">
                <th scope="row">{{ row.label }}<div class="sub">{{ row.layerName }}</div></th>
                <td>{{ row.targetImpedance }} ±{{ (row.tolerance * 100).toFixed(0) }} %</td>
                <td class="n lw-number">{{ mm(row.ours.width) }} → {{ mm(row.theirs.width) }} <span class="delta">{{ delta(row.differences.width) }}</span></td>
                <td class="n lw-number">{{ row.ours.gap === null ? '–' : mm(row.ours.gap) + ' → ' + (row.theirs.gap === null ? '–' : mm(row.theirs.gap)) }}</td>
                <td class="n lw-number">{{ row.theirs.impedance.toFixed(2) }} <span class="delta">{{ row.differences.impedancePercent >= 0 ? '+' : '' }}{{ row.differences.impedancePercent.toFixed(1) }} %</span></td>
                <td class="n lw-number">{{ row.ours.impedance.toFixed(2) }}</td>
                <td class="n lw-number">{{ row.linewrightAtTheirGeometry.toFixed(2) }}</td>
                <td>
                  @if (row.isOutOfTolerance) { <span class="flag"><mat-icon aria-hidden="true">error</mat-icon>{{ reason(row) }}</span> } @else { within tolerance }
                </td>
              </tr>
            }
          </tbody>
        </table>
      </div>
      <p class="note">{{ report.note }}</p>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; }
    .hint, .sub, .note { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .n { text-align: right !important; white-space: nowrap; }
    .delta { color: var(--mat-sys-on-surface-variant); font-size: 0.85em; }
    tr.is-out { background: color-mix(in srgb, var(--mat-sys-error-container) 45%, transparent); }
    .flag { display: inline-flex; gap: 4px; align-items: center; color: var(--mat-sys-error); }
    .flag mat-icon { font-size: 18px; width: 18px; height: 18px; }
    .summary { margin: 0; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FabricatorPanel {
  readonly stackupId = input.required<number>();
  readonly canUpload = input(false);
  private readonly api = inject(StackupsApi);
  /** The reply just uploaded, else the latest one stored. */
  protected readonly uploads = new UploadedReport<ReplyReport>(() => this.stackupId(), (id) => this.api.replies(id), (id, file) => this.api.uploadReply(id, file));
  protected readonly report = this.uploads.report;

  protected mm(metres: number): string {
    return (metres / MILLIMETRE).toFixed(4);
  }

  protected delta(metres: number): string {
    if (Math.abs(metres) < 0.5e-7) return '';
    return `${metres > 0 ? '+' : ''}${(metres / 1e-6).toFixed(1)} µm`;
  }

  protected reason(row: ReplyRow): string {
    if (!row.isTheirsWithinTolerance && !row.isOursAtTheirGeometryWithinTolerance) return 'both outside tolerance';
    return row.isTheirsWithinTolerance ? 'ours at their width outside tolerance' : 'their value outside tolerance';
  }
}
