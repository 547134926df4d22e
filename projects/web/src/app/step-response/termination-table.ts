import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { TerminationAdvice, TerminationScheme } from '@linewright/lines';
import { engineering } from '../shared/engineering-format';

/** Settling times within 1 % of the best count as equally fast. */
const FASTEST_MARGIN = 1.01;

export const SCHEME_LABELS: Record<TerminationScheme, string> = {
  none: 'None (as entered)',
  series: 'Series at the driver',
  parallel: 'Parallel at the load',
  thevenin: 'Thevenin divider at the load',
  rc: 'RC (AC) at the load',
};

/** The parts a scheme adds, in words. */
export function terminationParts(advice: TerminationAdvice): string {
  const { components: c } = advice;
  const ohms = (value: number | undefined) => engineering(value ?? NaN, 'Ω', 3);
  switch (advice.scheme) {
    case 'none':
      return 'Nothing added';
    case 'series':
      return `${ohms(c.seriesResistance)} in series with the driver`;
    case 'parallel':
      return `${ohms(c.resistance)} to ground`;
    case 'thevenin':
      return `${ohms(c.pullUpResistance)} to ${engineering(c.supplyVoltage ?? NaN, 'V', 3)}, ${ohms(c.pullDownResistance)} to ground`;
    case 'rc':
      return `${ohms(c.resistance)} + ${engineering(c.capacitance ?? NaN, 'F', 3)} to ground`;
  }
}

/**
 * The termination advisor's answer: each scheme matched to the line, what it
 * does to settling, level and DC power, and a button to fit it.
 */
@Component({
  selector: 'lw-termination-table',
  imports: [MatButtonModule],
  template: `
    <div class="table-wrap" tabindex="0" role="region" aria-label="Termination advisor">
      <table class="lw-data-table">
        <thead>
          <tr>
            <th scope="col">Termination</th>
            <th scope="col">Parts</th>
            <th scope="col">Load settles</th>
            <th scope="col">Final level</th>
            <th scope="col"><abbr title="Mean DC power in the termination's resistors for a 50 % duty square wave; transients ignored">DC power</abbr></th>
            <th scope="col"><span class="lw-visually-hidden">Fit</span></th>
          </tr>
        </thead>
        <tbody>
          @for (row of advice(); track row.scheme) {
            <tr [class.is-fitted]="row.scheme === fitted()" [class.is-best]="fastest().has(row.scheme)" [attr.data-scheme]="row.scheme">
              <th scope="row">
                {{ labels[row.scheme] }}
                @if (fastest().has(row.scheme)) { <span class="badge">fastest</span> }
              </th>
              @if (row.isApplicable) {
                <td>{{ parts(row) }}</td>
                <td class="lw-number">{{ settle(row.settleTime) }}</td>
                <td class="lw-number">
                  {{ volts(row.finalLevel) }}
                  @if (row.lowLevel !== 0) { <span class="low">low {{ volts(row.lowLevel) }}</span> }
                </td>
                <td class="lw-number" [attr.title]="'High ' + watts(row.powerHigh) + ', low ' + watts(row.powerLow)">{{ watts(row.averagePower) }}</td>
                <td>
                  @if (row.scheme === fitted()) {
                    <span class="fitted-note">Shown</span>
                  } @else {
                    <button mat-stroked-button type="button" (click)="fit.emit(row.scheme)"
                            [attr.aria-label]="row.scheme === 'none' ? 'Remove the termination' : 'Fit the ' + labels[row.scheme].toLowerCase() + ' termination'">
                      {{ row.scheme === 'none' ? 'Remove' : 'Fit' }}
                    </button>
                  }
                </td>
              } @else {
                <td colspan="5" class="not-applicable">Not applicable: {{ row.reason }}</td>
              }
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './termination-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TerminationTable {
  readonly advice = input.required<readonly TerminationAdvice[]>();
  readonly fitted = input<TerminationScheme>('none');
  readonly fit = output<TerminationScheme>();

  protected readonly labels = SCHEME_LABELS;
  protected readonly parts = terminationParts;

  /** The applicable schemes whose load settles first, within 1 % of each other (a tie is a tie). */
  protected readonly fastest = computed<ReadonlySet<TerminationScheme>>(() => {
    const settled = this.advice().filter((row) => row.isApplicable && Number.isFinite(row.settleTime));
    const best = Math.min(...settled.map((row) => row.settleTime));
    return new Set(settled.filter((row) => row.settleTime <= best * FASTEST_MARGIN).map((row) => row.scheme));
  });

  protected settle(seconds: number): string {
    return Number.isFinite(seconds) ? engineering(seconds, 's', 3) : 'never';
  }

  protected volts(value: number): string {
    return engineering(value, 'V', 4);
  }

  protected watts(value: number): string {
    return engineering(value, 'W', 3);
  }
}
