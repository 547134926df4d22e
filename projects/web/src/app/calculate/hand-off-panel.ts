import { ChangeDetectionStrategy, Component, DOCUMENT, computed, inject, input, signal } from '@angular/core';
import { Clipboard } from '@angular/cdk/clipboard';
import { RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import type { LineSpec } from '@linewright/lines';
import { Session } from '../core/session';
import { apiRequest } from './api-request';

/**
 * Hands the current line on: to the team catalog as a draft line type
 * (engineers and admins), and as an API request so a script can repeat the
 * calculation exactly.
 */
@Component({
  selector: 'lw-hand-off-panel',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    <section class="save" aria-labelledby="save-title">
      <div class="save-text">
        <h3 id="save-title">Save to the team catalog</h3>
        @if (session.canEdit()) {
          <p>Store this geometry as a draft line type with a target and tolerance; propose it for approval from the catalog.</p>
        } @else if (session.isSignedIn()) {
          <p data-save-note>Saving line types needs the engineer role; you are signed in as {{ session.user()?.role }}. Ask an admin, or hand on the API request below.</p>
        } @else {
          <p data-save-note><a routerLink="/sign-in" [queryParams]="{ returnUrl: '/calculate' }">Sign in</a> as an engineer to save this line to the team catalog.</p>
        }
      </div>
      @if (session.canEdit()) {
        <button mat-flat-button type="button" (click)="saveAsLineType()" [disabled]="!spec() || isOpening()"><mat-icon>bookmark_add</mat-icon>Save as line type</button>
      }
    </section>
    @if (request(); as request) {
      <p class="intro">Every quantity is in SI units (metres, hertz). Scripts may also send unit strings such as <code>"5 mil"</code> or <code>"1 oz"</code> —
        see the <a href="/api/docs" target="_blank" rel="noopener">API documentation</a>.</p>
      <div class="block">
        <div class="block-head"><span>curl</span>
          <button mat-stroked-button type="button" (click)="copy('curl', request.curl)"><mat-icon>content_copy</mat-icon>{{ copied() === 'curl' ? 'Copied' : 'Copy curl' }}</button>
        </div>
        <pre class="lw-number" data-request="curl">{{ request.curl }}</pre>
      </div>
      <div class="block">
        <div class="block-head"><span>JSON body</span>
          <button mat-stroked-button type="button" (click)="copy('json', request.json)"><mat-icon>content_copy</mat-icon>{{ copied() === 'json' ? 'Copied' : 'Copy JSON' }}</button>
        </div>
        <pre class="lw-number" data-request="json">{{ request.json }}</pre>
      </div>
    } @else {
      <p class="intro">Complete the inputs to get the request.</p>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; padding-top: 12px; }
    .save { display: flex; gap: 12px; align-items: center; justify-content: space-between; flex-wrap: wrap; padding: 12px 14px; border-radius: 12px; background: var(--mat-sys-surface-container); }
    .save-text { flex: 1 1 260px; }
    .save h3 { margin: 0 0 2px; font: var(--mat-sys-title-small); }
    .save p { margin: 0; color: var(--mat-sys-on-surface-variant); }
    .intro { margin: 0; color: var(--mat-sys-on-surface-variant); }
    .block { border: 1px solid var(--mat-sys-outline-variant); border-radius: 12px; overflow: hidden; }
    .block-head { display: flex; justify-content: space-between; align-items: center; padding: 6px 10px; background: var(--mat-sys-surface-container); font: var(--mat-sys-label-large); }
    pre { margin: 0; padding: 10px 12px; overflow-x: auto; font-size: 12.5px; white-space: pre-wrap; word-break: break-all; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HandOffPanel {
  readonly spec = input<LineSpec | undefined>();
  private readonly clipboard = inject(Clipboard);
  private readonly origin = inject(DOCUMENT).location.origin;
  private readonly dialog = inject(MatDialog);
  protected readonly session = inject(Session);
  protected readonly copied = signal<'curl' | 'json' | undefined>(undefined);
  protected readonly isOpening = signal(false);

  protected readonly request = computed(() => {
    const spec = this.spec();
    return spec ? apiRequest(spec, this.origin) : undefined;
  });

  /** The catalog's line type dialog, loaded on first use so the calculator stays light. */
  protected async saveAsLineType(): Promise<void> {
    const spec = this.spec();
    if (!spec) return;
    this.isOpening.set(true);
    try {
      const [{ LineTypeDialog }, { draftFromSpec }] = await Promise.all([import('../catalog/line-type-dialog'), import('../catalog/line-geometry')]);
      this.dialog.open(LineTypeDialog, { data: { draft: draftFromSpec(spec) }, width: '720px', maxWidth: '96vw' });
    } finally {
      this.isOpening.set(false);
    }
  }

  protected copy(which: 'curl' | 'json', text: string): void {
    if (this.clipboard.copy(text)) this.copied.set(which);
  }
}
