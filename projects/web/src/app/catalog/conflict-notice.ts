import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/**
 * Someone else changed the entry since it was read (409): says so and offers
 * to reload it. Reloading replaces the form with the stored entry, so the
 * person re-applies their change knowingly rather than overwriting another's.
 */
@Component({
  selector: 'lw-conflict-notice',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <div class="notice" role="alert">
      <mat-icon aria-hidden="true">sync_problem</mat-icon>
      <div class="text">
        <strong>Not saved: the entry changed meanwhile.</strong>
        <span>{{ message() }}</span>
        <span>Reloading shows the stored entry; your edits in this form are replaced, so note them first.</span>
      </div>
      <button mat-stroked-button type="button" (click)="reload.emit()">Reload the entry</button>
    </div>
  `,
  styles: `
    .notice { display: flex; gap: 12px; align-items: flex-start; flex-wrap: wrap; padding: 12px 14px; border-radius: 12px;
      background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
    .text { display: flex; flex-direction: column; gap: 2px; flex: 1 1 240px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConflictNotice {
  readonly message = input.required<string>();
  readonly reload = output<void>();
}
