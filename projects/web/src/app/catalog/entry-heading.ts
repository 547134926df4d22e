import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
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
          <span class="why">Read only: {{ readOnlyReason() }}</span>
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
  readonly canEdit = input(false);

  protected readonly readOnlyReason = computed(() => {
    if (!this.canEdit()) return 'your role reads the catalog; an engineer or admin changes it.';
    switch (this.entry()?.state) {
      case 'proposed':
        return 'it waits for approval. An admin approves it or sends it back to draft for changes.';
      case 'approved':
        return 'designs rely on approved entries. A change means a new draft.';
      default:
        return 'retired entries stay as they were; an admin can reinstate it.';
    }
  });
}
