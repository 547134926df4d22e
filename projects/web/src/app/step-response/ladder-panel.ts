import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { ladderError, ladderStepResponse, MAX_LADDER_SECTIONS, stepResponse, type StepCircuit } from '@linewright/lines';
import { engineering } from '../shared/engineering-format';
import { XyChart, type XySeries } from '../shared/xy-chart';
import { niceWindow } from './axis-scale';
import { timeScaleOf } from './time-series';

/** Section counts always compared, beside the one typed. */
const STANDARD_COUNTS = [1, 2, 5, 10, 20, 50, 100, 200] as const;
/**
 * Samples per ladder solve. Each is a frequency-domain solve and the table
 * needs several per keystroke; 1024 already widens a 100 ps edge over a
 * 25 ns window (the library warns), which would hide the lumping error.
 */
const LADDER_POINTS = 2048;

/**
 * How many lumped RLGC sections a model of this line needs: the ladder's
 * load-voltage error against the distributed line for several N, and the
 * typed N overlaid on the line.
 */
@Component({
  selector: 'lw-ladder-panel',
  imports: [MatFormFieldModule, MatInputModule, XyChart],
  template: `
    <div class="controls">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Sections N</mat-label>
        <input matInput type="number" name="sections" min="1" [max]="maxSections" step="1" [value]="sections()"
               (input)="setSections($any($event.target).value)" aria-describedby="sections-hint" />
        <mat-hint id="sections-hint">Each section is R, L of 1/N of the line between two shunt halves of G, C (Π).</mat-hint>
      </mat-form-field>
      @if (outcome(); as o) {
        @if (o.errors) {
          <p class="verdict" [class.is-good]="o.needed !== undefined" data-ladder-verdict>
            @if (o.needed !== undefined) {
              About <strong>{{ o.needed }} sections</strong> bring the worst error within the {{ bandPercent() }} % settle band.
            } @else {
              Even {{ o.largest }} sections leave the worst error above the {{ bandPercent() }} % settle band: model it as a distributed line.
            }
          </p>
        }
      }
    </div>
    @if (outcome(); as o) {
      @if (o.errors) {
        @for (warning of o.warnings; track $index) {
          <p class="warning">{{ warning }}</p>
        }
        <div class="layout">
          <div class="table-wrap" tabindex="0" role="region" aria-label="Ladder error versus sections">
            <table class="lw-data-table is-numeric">
              <thead>
                <tr><th scope="col">N</th><th scope="col">Worst error</th><th scope="col">RMS error</th><th scope="col">Load settles</th></tr>
              </thead>
              <tbody>
                @for (row of o.errors; track row.sections) {
                  <tr [class.is-chosen]="row.sections === sections()" [attr.data-sections]="row.sections">
                    <td class="lw-number">{{ row.sections }}</td>
                    <td class="lw-number">{{ percent(row.maxError) }}</td>
                    <td class="lw-number">{{ percent(row.rmsError) }}</td>
                    <td class="lw-number">{{ settle(row.settleTime) }}</td>
                  </tr>
                }
                <tr class="reference">
                  <td>Line</td><td class="lw-number">—</td><td class="lw-number">—</td>
                  <td class="lw-number">{{ settle(o.errors[0].referenceSettleTime) }}</td>
                </tr>
              </tbody>
            </table>
            <p class="caption">"Not yet": not settled within the window. Errors are of the load voltage, as a share of its final value, over the whole window, for the circuit as entered (without a fitted termination).</p>
          </div>
          @if (o.chart) {
            <lw-xy-chart [series]="o.chart.series" [xLabel]="o.chart.xLabel" yLabel="Load voltage [V]"
                         ariaLabel="Load voltage of the line and of the lumped ladder" />
          }
        </div>
      } @else {
        <p class="note" role="status">{{ o.problem }}</p>
      }
    }
  `,
  styleUrl: './ladder-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LadderPanel {
  readonly circuit = input.required<StepCircuit>();
  readonly band = input.required<number>();

  protected readonly maxSections = MAX_LADDER_SECTIONS;
  protected readonly sections = signal(20);
  protected readonly bandPercent = computed(() => +(this.band() * 100).toPrecision(3));

  protected readonly outcome = computed(() => {
    const circuit = this.circuit();
    const sections = this.sections();
    if (!Number.isInteger(sections) || sections < 1 || sections > MAX_LADDER_SECTIONS) {
      return { problem: `Enter a whole number of sections from 1 to ${MAX_LADDER_SECTIONS}.` };
    }
    const counts = [...new Set([...STANDARD_COUNTS, sections])].sort((a, b) => a - b);
    const options = { points: LADDER_POINTS, band: this.band() };
    try {
      const errors = ladderError(circuit, counts, options);
      const needed = errors.find((row) => row.maxError <= this.band())?.sections;
      const line = stepResponse(circuit, options);
      const ladder = ladderStepResponse(circuit, sections, { ...options, duration: line.time.at(-1) });
      const scale = timeScaleOf(line.time);
      const x = line.time.map((t) => t / scale.factor);
      const window = niceWindow(x[0], x.at(-1)!);
      const series: XySeries[] = [
        { label: 'Distributed line', x, y: line.load.voltage },
        { label: `${sections}-section ladder`, x: ladder.time.map((t) => t / scale.factor), y: ladder.load.voltage },
        { label: 'Final level', x: [window.start, window.end], y: [line.load.final, line.load.final], isReference: true },
      ];
      const warnings = [...new Set(ladder.warnings.filter((warning) => !line.warnings.includes(warning)))];
      return { errors, needed, largest: counts.at(-1), warnings, chart: { series, xLabel: `Time [${scale.unit}]` } };
    } catch (error) {
      // The ladder is solved in the frequency domain and refuses an ideal step; show the library's words.
      return { problem: error instanceof Error ? error.message : String(error) };
    }
  });

  protected setSections(text: string): void {
    this.sections.set(text === '' ? NaN : Number(text));
  }

  protected percent(fraction: number): string {
    return `${+(fraction * 100).toPrecision(3)} %`;
  }

  protected settle(seconds: number): string {
    return Number.isFinite(seconds) ? engineering(seconds, 's', 3) : 'not yet';
  }
}
