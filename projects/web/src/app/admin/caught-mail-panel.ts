import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { DatePipe } from '@angular/common';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { toApiProblem } from '../core/api-problem';
import { AdminApi } from './admin-api';

/** Development only: what the local SMTP catcher caught. Nothing here was delivered. */
@Component({
  selector: 'lw-caught-mail-panel',
  imports: [DatePipe, MatButtonModule, MatExpansionModule, MatIconModule, MatProgressSpinnerModule],
  template: `
    <div class="head">
      <p class="lead">Development only: mail the local catcher kept instead of sending (invitations, reset links).</p>
      <button mat-stroked-button type="button" (click)="mail.reload()"><mat-icon>refresh</mat-icon>Refresh</button>
    </div>
    @if (mail.isLoading() && !mail.hasValue()) {
      <div class="lw-state"><mat-spinner diameter="28" aria-label="Loading caught mail" /></div>
    } @else if (isAbsent()) {
      <div class="lw-state">This server does not catch mail (production): messages go out by SMTP.</div>
    } @else if (mail.error()) {
      <div class="lw-state is-error" role="alert">{{ loadProblem() }}</div>
    } @else if ((mail.value() ?? []).length === 0) {
      <div class="lw-state">No mail caught yet.</div>
    } @else {
      <mat-accordion>
        @for (message of mail.value(); track message.id) {
          <mat-expansion-panel>
            <mat-expansion-panel-header>
              <mat-panel-title>{{ message.subject }}</mat-panel-title>
              <mat-panel-description>To {{ message.to.join(', ') }} · {{ message.receivedAt | date: 'short' }}</mat-panel-description>
            </mat-expansion-panel-header>
            <pre class="lw-number">{{ message.text }}</pre>
          </mat-expansion-panel>
        }
      </mat-accordion>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; padding-top: 16px; }
    .head { display: flex; justify-content: space-between; align-items: center; gap: 12px; flex-wrap: wrap; }
    .head p { margin: 0; }
    pre { white-space: pre-wrap; word-break: break-all; margin: 0; font-size: 13px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CaughtMailPanel {
  private readonly api = inject(AdminApi);
  protected readonly mail = rxResource({ stream: () => this.api.caughtMail() });
  protected readonly isAbsent = computed(() => this.mail.error() !== undefined && toApiProblem(this.mail.error()).status === 404);
  protected readonly loadProblem = computed(() => toApiProblem(this.mail.error()).message);
}
