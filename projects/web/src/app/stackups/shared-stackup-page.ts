import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DatePipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { toApiProblem } from '../core/api-problem';
import { ImpedanceTablePanel } from './impedance-table-panel';
import { StackDrawing } from './stack-drawing';
import { StackupsApi } from './stackups-api';

/** What the fabricator sees from the e-mailed link: the stack and its impedance table, read-only, with the downloads. */
@Component({
  selector: 'lw-shared-stackup-page',
  imports: [DatePipe, MatButtonModule, MatButtonToggleModule, MatIconModule, ImpedanceTablePanel, StackDrawing],
  template: `
    <section class="lw-page">
      @if (problem(); as problem) {
        <p class="lw-state is-error" role="alert">{{ problem }}</p>
      } @else if (shared.value(); as shared) {
        <header class="head">
          <div>
            <h1>{{ shared.stackup.name }}</h1>
            <p class="lead">Shared read-only with {{ shared.share.email }} until {{ shared.share.expiresAt | date: 'mediumDate' }} · version {{ shared.table.stackup.version }}
              @if (shared.share.isChangedSinceShared) { (changed since version {{ shared.share.sharedVersion }} was shared) }</p>
          </div>
          <div class="lw-actions">
            <a mat-stroked-button [href]="api.sharedExportUrl(token(), 'csv')"><mat-icon>table_view</mat-icon>CSV</a>
            <a mat-stroked-button [href]="api.sharedExportUrl(token(), 'pdf')" target="_blank" rel="noopener"><mat-icon>picture_as_pdf</mat-icon>PDF</a>
          </div>
        </header>
        <section class="lw-card">
          <h2>Impedance table</h2>
          <lw-impedance-table-panel [rows]="shared.table.rows" [layers]="shared.table.layers" [isEditable]="false" />
          <p class="note">Send the CSV back with your adjusted widths, gaps and heights and your computed impedance in the same columns. {{ shared.table.note }}</p>
        </section>
        <section class="lw-card">
          <div class="card-head">
            <h2>Stack</h2>
            <mat-button-toggle-group [value]="isZoomed()" (change)="isZoomed.set($event.value)" aria-label="Drawing scale" hideSingleSelectionIndicator>
              <mat-button-toggle [value]="false">To scale</mat-button-toggle>
              <mat-button-toggle [value]="true">Zoom thin layers</mat-button-toggle>
            </mat-button-toggle-group>
          </div>
          <lw-stack-drawing [layers]="shared.table.layers" [lines]="lines()" [isZoomed]="isZoomed()" />
        </section>
      } @else {
        <p class="lw-state">Opening the shared table…</p>
      }
    </section>
  `,
  styles: `
    .head { display: flex; flex-wrap: wrap; gap: 12px 24px; justify-content: space-between; align-items: flex-end; }
    .card-head { display: flex; flex-wrap: wrap; gap: 8px 16px; align-items: center; justify-content: space-between; }
    .note { margin: 0; color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SharedStackupPage {
  /** The link's ?token=. */
  readonly token = input('');
  protected readonly api = inject(StackupsApi);
  protected readonly isZoomed = signal(true);
  protected readonly shared = rxResource({ params: () => this.token(), stream: ({ params }) => this.api.shared(params) });
  protected readonly problem = computed(() => (this.shared.error() ? toApiProblem(this.shared.error()).message : this.token() ? undefined : 'This link has no token.'));
  protected readonly lines = computed(() => (this.shared.value()?.table.rows ?? []).map((row) => ({ label: row.label, layerIndex: row.layerIndex, structure: row.structure })));
}
