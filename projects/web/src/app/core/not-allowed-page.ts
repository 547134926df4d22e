import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Session } from './session';

/** Where a role guard sends someone signed in without the role a screen needs. */
@Component({
  selector: 'lw-not-allowed-page',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    <section class="lw-page lw-narrow-page notice">
      <mat-icon class="big" aria-hidden="true">lock</mat-icon>
      <h1>Not available to your role</h1>
      <p>This screen needs the <strong>{{ needs() || 'admin' }}</strong> role; you are signed in as
        <strong>{{ session.user()?.role ?? 'nobody' }}</strong>. An admin can change your role.</p>
      <a mat-flat-button routerLink="/calculate">Back to the calculator</a>
    </section>
  `,
  styles: `
    .notice { text-align: center; }
    .big { font-size: 48px; width: 48px; height: 48px; color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotAllowedPage {
  readonly needs = input<string>();
  protected readonly session = inject(Session);
}
