import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { sweep, type FieldDescription, type LineSpec } from '@linewright/lines';
import { XyChart, type XySeries } from '../shared/xy-chart';
import { unitFactor } from '../shared/unit-choices';
import { trimmed } from '../shared/engineering-format';
import type { UnitMap } from './line-form';

interface SweepOutput {
  id: 'impedance' | 'erEff' | 'delayPerMeter' | 'lossDbPerMeter';
  label: string;
}

const OUTPUTS: readonly SweepOutput[] = [
  { id: 'impedance', label: 'Impedance [Ω]' },
  { id: 'erEff', label: 'εeff' },
  { id: 'delayPerMeter', label: 'Delay [ps/mm]' },
  { id: 'lossDbPerMeter', label: 'Loss [dB/m]' },
];

/** Points a sweep computes while the user types (the library's bench holds 200 points inside one frame). */
const LIVE_POINTS = 200;
const FREQUENCY_RANGE = { from: 1e7, to: 2e10 } as const;

/** One input stepped across a range, computed live in the browser and charted. */
@Component({
  selector: 'lw-sweep-panel',
  imports: [MatFormFieldModule, MatInputModule, MatSelectModule, XyChart],
  template: `
    <div class="controls">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Step this input</mat-label>
        <mat-select [value]="field()" (valueChange)="chooseField($event)" name="sweepField">
          @for (candidate of sweepable(); track candidate.name) {
            <mat-option [value]="candidate.name">{{ candidate.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>From</mat-label>
        <input matInput type="number" step="any" name="sweepFrom" [value]="shown(range().from)" (change)="setEnd('from', $any($event.target).value)" />
        <span matTextSuffix>{{ unitLabel() }}</span>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>To</mat-label>
        <input matInput type="number" step="any" name="sweepTo" [value]="shown(range().to)" (change)="setEnd('to', $any($event.target).value)" />
        <span matTextSuffix>{{ unitLabel() }}</span>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Show</mat-label>
        <mat-select [value]="output()" (valueChange)="output.set($event)" name="sweepOutput">
          @for (choice of outputs; track choice.id) {
            <mat-option [value]="choice.id">{{ choice.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
    </div>
    @if (chart(); as chart) {
      @if (chart.series) {
        <lw-xy-chart [series]="chart.series" [xLabel]="chart.xLabel" [yLabel]="outputLabel()" [logX]="field() === 'frequency'"
                     ariaLabel="Sweep chart" />
      } @else {
        <p class="note" role="status">{{ chart.error }}</p>
      }
    } @else {
      <p class="note">Complete the inputs to sweep.</p>
    }
  `,
  styles: `
    :host { display: block; padding-top: 12px; }
    .controls { display: grid; grid-template-columns: repeat(auto-fit, minmax(150px, 1fr)); gap: 8px; margin-bottom: 8px; }
    .note { color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepPanel {
  readonly spec = input<LineSpec | undefined>();
  readonly fields = input.required<readonly FieldDescription[]>();
  readonly isCoupled = input(false);
  readonly units = input<UnitMap>({});

  protected readonly outputs = OUTPUTS;
  protected readonly output = signal<SweepOutput['id']>('impedance');
  private readonly chosenField = signal<string | undefined>(undefined);
  private readonly chosenRange = signal<{ from: number; to: number } | undefined>(undefined);

  protected readonly sweepable = computed(() =>
    this.fields().filter((field) => field.quantity !== 'boolean' && (!field.isOptional || field.name === 'frequency' || field.name === 'length')),
  );
  protected readonly field = computed(() => this.chosenField() ?? this.sweepable()[0]?.name ?? 'w');
  private readonly description = computed(() => this.fields().find((field) => field.name === this.field()));
  private readonly unit = computed(() => this.units()[this.field()] ?? '');
  protected readonly unitLabel = computed(() => (this.unit() === 'um' ? 'µm' : this.unit()));
  protected readonly outputLabel = computed(() => OUTPUTS.find((choice) => choice.id === this.output())?.label ?? '');

  /** Half to twice the current value unless the user set the ends; frequency spans 10 MHz–20 GHz. */
  protected readonly range = computed(() => {
    const chosen = this.chosenRange();
    if (chosen) return chosen;
    if (this.field() === 'frequency') return FREQUENCY_RANGE;
    const current = (this.spec() as unknown as Record<string, number> | undefined)?.[this.field()];
    const fallback = this.description()?.defaultValue;
    const centre = typeof current === 'number' && current > 0 ? current : typeof fallback === 'number' && fallback > 0 ? fallback : 1;
    return { from: centre / 2, to: centre * 2 };
  });

  protected readonly chart = computed<{ series: XySeries[]; xLabel: string } | { series?: undefined; error: string } | undefined>(() => {
    const spec = this.spec();
    if (!spec) return undefined;
    const field = this.field();
    const { from, to } = this.range();
    try {
      const result = sweep(spec, field, from, to, LIVE_POINTS, { spacing: field === 'frequency' ? 'log' : 'linear' });
      const x = result.x.map((value) => value / unitFactor(this.unit()));
      const series = this.seriesOf(result.series, x);
      if (series.length === 0) return { error: 'Set a frequency (or sweep the frequency) to chart the loss.' };
      return { series, xLabel: `${this.description()?.label ?? field} [${this.unitLabel() || 'SI'}]` };
    } catch (error) {
      // An end of the range can make the geometry impossible (e.g. gap below zero); say so instead of charting.
      return { error: error instanceof Error ? error.message : String(error) };
    }
  });

  protected chooseField(field: string): void {
    this.chosenField.set(field);
    this.chosenRange.set(undefined);
  }

  protected setEnd(end: 'from' | 'to', text: string): void {
    const value = Number(text) * unitFactor(this.unit());
    if (!Number.isFinite(value)) return;
    this.chosenRange.set({ ...this.range(), [end]: value });
  }

  protected shown(value: number): string {
    return trimmed(value / unitFactor(this.unit()), 5);
  }

  private seriesOf(series: ReturnType<typeof sweep>['series'], x: number[]): XySeries[] {
    switch (this.output()) {
      case 'impedance':
        return this.isCoupled() && series.zDiff
          ? [{ label: 'Differential Z', x, y: series.zDiff }, { label: 'Z0 (√(Zodd·Zeven))', x, y: series.z0 }]
          : [{ label: 'Z0', x, y: series.z0 }];
      case 'erEff':
        return [{ label: 'εeff', x, y: series.erEff }];
      case 'delayPerMeter':
        return [{ label: 'Delay', x, y: series.delayPerMeter.map((value) => value * 1e9) }];
      case 'lossDbPerMeter':
        return series.lossDbPerMeter ? [{ label: 'Loss', x, y: series.lossDbPerMeter }] : [];
    }
  }
}
