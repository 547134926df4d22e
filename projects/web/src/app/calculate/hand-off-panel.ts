import { ChangeDetectionStrategy, Component, DOCUMENT, computed, inject, input, signal } from '@angular/core';
import { Clipboard } from '@angular/cdk/clipboard';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { LineSpec } from '@linewright/lines';
import { apiRequest } from './api-request';

/** The current line as an API request, so a script can repeat the calculation exactly. */
@Component({
  selector: 'lw-hand-off-panel',
  imports: [MatButtonModule, MatIconModule],
  template: `
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
  protected readonly copied = signal<'curl' | 'json' | undefined>(undefined);

  protected readonly request = computed(() => {
    const spec = this.spec();
    return spec ? apiRequest(spec, this.origin) : undefined;
  });

  protected copy(which: 'curl' | 'json', text: string): void {
    if (this.clipboard.copy(text)) this.copied.set(which);
  }
}
