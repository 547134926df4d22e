import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { XyChart, type XySeries } from '../shared/xy-chart';
import { CsvPicker } from './csv-picker';
import { UploadedReport, UploadProblems } from './uploaded-report';
import { StackupsApi } from './stackups-api';
import type { CouponReport } from './stackup-types';

/** Samples outside [0.7 × band low, 1.3 × band high] are not drawn. */
const CHART_CLIP = [0.7, 1.3] as const;

/** Axis unit for the chart: ns for time, mm for distance. */
const AXIS = { time: { scale: 1e-9, label: 'Time [ns]' }, distance: { scale: 1e-3, label: 'Distance [mm]' } } as const;

/**
 * A coupon measurement (impedance against time or distance, one column per
 * line) overlaid on each line's target with its tolerance band and the
 * evaluation window, with pass/fail per line.
 */
@Component({
  selector: 'lw-coupon-panel',
  imports: [XyChart, CsvPicker, UploadProblems],
  template: `
    <div class="lw-actions">
      <lw-csv-picker label="Upload a coupon trace" name="coupon" [disabled]="!canUpload()" (picked)="uploads.upload($event)" />
      <span class="hint">First column <code>time_ns</code>, <code>time_ps</code> or <code>distance_mm</code>; one column of ohms per line, headed by its label.</span>
    </div>
    <lw-upload-problems [problems]="uploads.problems()" />
    @if (report(); as report) {
      <ul class="verdicts" aria-label="Coupon verdicts">
        @for (line of report.lines; track line.label) {
          <li [class.is-fail]="!line.isPass" [attr.data-line]="line.label">
            <strong>{{ line.isPass ? 'Pass' : 'Fail' }}</strong> {{ line.label }}: {{ line.measured.min.toFixed(1) }}–{{ line.measured.max.toFixed(1) }} Ω in the window
            (band {{ line.bandLow.toFixed(1) }}–{{ line.bandHigh.toFixed(1) }} Ω, computed {{ line.computedImpedance.toFixed(1) }} Ω)
          </li>
        }
      </ul>
      <lw-xy-chart [series]="series()" [xLabel]="axisLabel()" yLabel="Impedance [Ω]" ariaLabel="Coupon traces against their tolerance bands" />
      <p class="hint">Dashed: targets and ± tolerance bands; the dashed verticals mark the evaluation window ({{ windowText() }}); samples far outside the band (launch, open end) are not drawn but count in the verdict. {{ report.note }}</p>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; }
    .hint { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .verdicts { margin: 0; padding-left: 20px; }
    .verdicts li strong { color: var(--mat-sys-primary); }
    .verdicts li.is-fail strong { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CouponPanel {
  readonly stackupId = input.required<number>();
  readonly canUpload = input(false);
  private readonly api = inject(StackupsApi);
  /** The measurement just uploaded, else the latest one stored. */
  protected readonly uploads = new UploadedReport<CouponReport>(() => this.stackupId(), (id) => this.api.coupons(id), (id, file) => this.api.uploadCoupon(id, file));
  protected readonly report = this.uploads.report;

  protected readonly axisLabel = computed(() => AXIS[this.report()?.axis ?? 'time'].label);
  protected readonly windowText = computed(() => {
    const report = this.report();
    if (!report) return '';
    const { scale } = AXIS[report.axis];
    return `${(report.window.from / scale).toPrecision(3)} to ${(report.window.to / scale).toPrecision(3)}`;
  });

  /** Each measured trace, then its target and band as dashed references, then the window edges. */
  protected readonly series = computed<XySeries[]>(() => {
    const report = this.report();
    if (!report) return [];
    const { scale } = AXIS[report.axis];
    const series: XySeries[] = [];
    const xs = report.lines.flatMap((line) => line.trace.x);
    const [first, last] = [Math.min(...xs) / scale, Math.max(...xs) / scale];
    for (const line of report.lines) {
      // The launch and the open end reach far outside the band; they are left out of the chart (not of the verdict) so the band stays readable.
      const shown = line.trace.impedance.map((z) => (z >= line.bandLow * CHART_CLIP[0] && z <= line.bandHigh * CHART_CLIP[1] ? z : Number.NaN));
      series.push({ label: `${line.label} measured`, x: line.trace.x.map((x) => x / scale), y: shown });
      series.push({ label: `${line.label} target`, x: [first, last], y: [line.targetImpedance, line.targetImpedance], isReference: true });
      series.push({ label: `${line.label} ±${(line.tolerance * 100).toFixed(0)} %`, x: [first, last, Number.NaN, first, last], y: [line.bandLow, line.bandLow, Number.NaN, line.bandHigh, line.bandHigh], isReference: true });
    }
    const low = Math.min(...report.lines.map((line) => line.bandLow)) * 0.9;
    const high = Math.max(...report.lines.map((line) => line.bandHigh)) * 1.1;
    series.push({ label: 'window', x: [report.window.from / scale, report.window.from / scale, Number.NaN, report.window.to / scale, report.window.to / scale], y: [low, high, Number.NaN, low, high], isReference: true });
    return series;
  });

}
