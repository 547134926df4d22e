import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { DatePipe } from '@angular/common';
import type { CatalogEntry } from './catalog-types';

/** A dialog's title line: what it is, its state chip and version, and why it may be read-only. */
@Component({
  selector: 'lw-entry-heading',
  imports: [DatePipe],
  template: `
    <div class="meta">
      @if (entry(); as entry) {
        <span class="lw-state-chip" [attr.data-state]="entry.state">{{ entry.state }}</span>
        <span>Version {{ entry.version }} · updated {{ entry.updatedAt | date: 'medium' }}</span>
        @if (!isEditable()) {
          <span class="why">{{ entry.state === 'draft' ? 'Read only: your role cannot edit the catalog.' : 'Read only: only drafts are edited. An approved entry changes by a new draft.' }}</span>
        }
      } @else {
        <span>New entries start as drafts; propose them for approval when ready.</span>
      }
    </div>
  `,
  styles: `
    .meta { display: flex; flex-wrap: wrap; gap: 8px 12px; align-items: center; color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .why { flex-basis: 100%; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryHeading {
  readonly entry = input<CatalogEntry | undefined>();
  readonly isEditable = input(true);
}
