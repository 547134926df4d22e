import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Arrival, StepResponse } from '@linewright/lines';
import { engineering } from '../shared/engineering-format';
import { SERIES_COLOURS } from '../shared/xy-chart';
import { arrivalSteps, bounceGeometry } from './bounce-geometry';

/** Rows the arrivals table lists before it stops (the lattice can follow thousands). */
const MAX_TABLE_ROWS = 60;

interface ArrivalRow {
  index: number;
  arrival: Arrival;
  step: number;
}

/**
 * The lattice (bounce) diagram drawn from the exact solution's arrivals, and
 * the table of every arrival. Only the lattice method has arrivals; for other
 * circuits the panel says why there is no diagram.
 */
@Component({
  selector: 'lw-bounce-panel',
  template: `
    @if (geometry(); as g) {
      <div class="layout">
        <figure class="diagram">
          <svg [attr.viewBox]="'0 0 ' + g.width + ' ' + g.height" role="img"
               [attr.aria-label]="'Bounce diagram: ' + g.marks.length + ' arrivals between the source and the load'">
            <text class="end-name" [attr.x]="g.sourceX" y="18" text-anchor="middle">Source</text>
            <text class="end-name" [attr.x]="g.loadX" y="18" text-anchor="middle">Load</text>
            <text class="gamma" [attr.x]="g.sourceX" y="36" text-anchor="middle">ΓS = {{ fixed(reflection().source) }}</text>
            <text class="gamma" [attr.x]="g.loadX" y="36" text-anchor="middle">ΓL = {{ fixed(reflection().load) }}</text>
            @for (mark of g.marks; track $index) {
              <line class="time-rule" [attr.x1]="g.sourceX" [attr.x2]="g.loadX" [attr.y1]="mark.y" [attr.y2]="mark.y" />
            }
            <line class="end" [attr.x1]="g.sourceX" [attr.x2]="g.sourceX" [attr.y1]="g.top - 8" [attr.y2]="g.bottom + 14"
                  [attr.stroke]="colours.source" />
            <line class="end" [attr.x1]="g.loadX" [attr.x2]="g.loadX" [attr.y1]="g.top - 8" [attr.y2]="g.bottom + 14"
                  [attr.stroke]="colours.load" />
            <text class="time-arrow" [attr.x]="g.width / 2" [attr.y]="g.height - 4" text-anchor="middle">time ↓</text>
            @for (segment of g.segments; track $index) {
              <line class="wave" [attr.x1]="segment.x1" [attr.y1]="segment.y1" [attr.x2]="segment.x2" [attr.y2]="segment.y2" />
              <text class="wave-label" [attr.x]="segment.midX" [attr.y]="segment.midY - 4" text-anchor="middle">{{ signed(segment.wave) }}</text>
            }
            <circle class="departure" [attr.cx]="g.sourceX" [attr.cy]="g.top" r="3.5" [attr.fill]="colours.source" />
            @for (mark of g.marks; track $index) {
              <circle [attr.cx]="mark.x" [attr.cy]="mark.y" r="3.5" [attr.fill]="mark.arrival.end === 'source' ? colours.source : colours.load" />
              <text class="mark-time" [attr.x]="mark.labelX" [attr.y]="mark.y - 2" [attr.text-anchor]="mark.anchor">{{ time(mark.arrival.time) }}</text>
              <text class="mark-level" [attr.x]="mark.labelX" [attr.y]="mark.y + 12" [attr.text-anchor]="mark.anchor">{{ volts(mark.arrival.voltage) }}</text>
            }
          </svg>
          <figcaption>
            Each slanted line is one wave, labelled with its height; each dot is an arrival with its time (50 % point of the step) and
            the end's voltage after it.
            @if (g.omitted > 0) { The next {{ g.omitted }} arrivals are in the table. }
          </figcaption>
        </figure>

        <div class="table-wrap" tabindex="0" role="region" aria-label="Arrivals">
          <table class="arrivals lw-data-table is-numeric">
            <caption>Arrivals</caption>
            <thead>
              <tr><th scope="col">#</th><th scope="col">Time</th><th scope="col">End</th><th scope="col">Step</th><th scope="col">Level after</th></tr>
            </thead>
            <tbody>
              @for (row of rows(); track row.index) {
                <tr [attr.data-arrival]="row.index">
                  <td class="lw-number">{{ row.index + 1 }}</td>
                  <td class="lw-number" data-cell="time">{{ time(row.arrival.time) }}</td>
                  <td>{{ row.arrival.end === 'source' ? 'Source' : 'Load' }}</td>
                  <td class="lw-number">{{ signed(row.step) }}</td>
                  <td class="lw-number" data-cell="level">{{ volts(row.arrival.voltage) }}</td>
                </tr>
              }
            </tbody>
          </table>
          @if (response().arrivals.length > rows().length) {
            <p class="more">… and {{ response().arrivals.length - rows().length }} smaller ones until the ends settle.</p>
          }
        </div>
      </div>
    } @else {
      <p class="explain" data-no-diagram>
        No bounce diagram for this circuit. The lattice picture holds only for a lossless line between resistive ends, where each
        wave arrives as a clean step. {{ reason() }} It is solved in the frequency domain instead; the time plot shows its exact shape.
      </p>
    }
  `,
  styleUrl: './bounce-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BouncePanel {
  readonly response = input.required<StepResponse>();
  readonly amplitude = input.required<number>();
  /** Why the circuit is off the lattice path, in words (e.g. "The load has a capacitor."). */
  readonly reason = input('');

  protected readonly colours = { source: SERIES_COLOURS[0], load: SERIES_COLOURS[1] };
  protected readonly reflection = computed(() => ({ source: this.response().reflection.source, load: this.response().reflection.load ?? 0 }));

  protected readonly geometry = computed(() => {
    const { arrivals, method } = this.response();
    // On the lattice the first arrival is at the load after exactly one delay.
    if (method !== 'lattice' || arrivals.length === 0) return undefined;
    return bounceGeometry({ arrivals, delay: arrivals[0].time, reflection: this.reflection(), amplitude: this.amplitude() });
  });

  protected readonly rows = computed<ArrivalRow[]>(() => {
    const arrivals = this.response().arrivals.slice(0, MAX_TABLE_ROWS);
    const steps = arrivalSteps(arrivals, this.reflection(), this.amplitude());
    return arrivals.map((arrival, index) => ({ index, arrival, step: steps[index] }));
  });

  protected time(seconds: number): string {
    return engineering(seconds, 's');
  }

  protected volts(value: number): string {
    return engineering(value, 'V');
  }

  protected signed(value: number): string {
    const text = engineering(Math.abs(value) < 1e-15 ? 0 : value, 'V');
    return value > 0 ? `+${text}` : text.replace('-', '−');
  }

  protected fixed(value: number): string {
    return (Math.abs(value) < 5e-5 ? 0 : value).toFixed(3).replace('-', '−');
  }
}
