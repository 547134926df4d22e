import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { LineResult } from '@linewright/lines';
import { trimmed } from '../shared/engineering-format';

export type ServerCheckState =
  | { status: 'idle' }
  | { status: 'pending' }
  | { status: 'unreachable' }
  | { status: 'answered'; result: LineResult };

/** Relative difference below which the browser's and the server's numbers count as the same. */
const AGREEMENT = 1e-9;

/** Shows whether the API, computing with the same library, returns the same impedance. */
@Component({
  selector: 'lw-server-check',
  imports: [MatIconModule],
  template: `
    @switch (view().tone) {
      @case ('agrees') {
        <p class="check agrees" data-check="agrees"><mat-icon aria-hidden="true">cloud_done</mat-icon>{{ view().text }}</p>
      }
      @case ('differs') {
        <p class="check differs" data-check="differs"><mat-icon aria-hidden="true">error</mat-icon>{{ view().text }}</p>
      }
      @default {
        <p class="check" data-check="waiting"><mat-icon aria-hidden="true">cloud_sync</mat-icon>{{ view().text }}</p>
      }
    }
  `,
  styles: `
    .check { display: flex; align-items: center; gap: 8px; margin: 0; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .check mat-icon { font-size: 18px; width: 18px; height: 18px; }
    .agrees mat-icon { color: var(--lw-good); }
    .differs { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ServerCheck {
  readonly state = input.required<ServerCheckState>();
  readonly local = input<LineResult | undefined>();

  protected readonly view = computed(() => {
    const state = this.state();
    const local = this.local();
    if (state.status === 'pending') return { tone: 'waiting', text: 'Asking the API to confirm…' };
    if (state.status === 'unreachable') return { tone: 'waiting', text: 'The API could not be reached; figures are computed in this browser.' };
    if (state.status !== 'answered' || !local) return { tone: 'waiting', text: 'The API confirms figures once the inputs are complete.' };
    const difference = Math.abs(state.result.z0 - local.z0) / local.z0;
    return difference <= AGREEMENT
      ? { tone: 'agrees', text: `The API computed the same Z0 (${trimmed(state.result.z0, 6)} Ω).` }
      : { tone: 'differs', text: `The API computed Z0 = ${trimmed(state.result.z0, 6)} Ω, ${trimmed(difference * 100, 3)} % from this browser's figure.` };
  });
}
