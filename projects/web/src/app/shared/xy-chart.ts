import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, effect, inject, input, viewChild } from '@angular/core';
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Filler,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  Tooltip,
  type ChartConfiguration,
} from 'chart.js';
import { ThemeMode } from '../core/theme-mode';

Chart.register(LineController, BarController, LineElement, BarElement, PointElement, LinearScale, LogarithmicScale, CategoryScale, Tooltip, Legend, Filler);

export interface XySeries {
  label: string;
  x: readonly number[];
  y: readonly number[];
  /** Dashed lines for reference levels (targets, tolerance bands). */
  isReference?: boolean;
}

/** Series colours of our own palette, distinct in both themes. */
export const SERIES_COLOURS = ['#1d8a96', '#c27a35', '#8a5fb4', '#6f8f2a', '#c2475f', '#4d6fd1'];

/** Axis text and grid colours per theme, matching the palette's neutral tones. */
const CHART_INK = { light: '#3f4949', dark: '#bec8c9' };
const CHART_GRID = { light: '#dbe4e5', dark: '#3f4949' };

/**
 * A small chart.js wrapper for x–y lines and histograms. Charts live only in
 * lazy-loaded screens, so chart.js never weighs on the first page load.
 */
@Component({
  selector: 'lw-xy-chart',
  template: `<div class="frame"><canvas #canvas role="img" [attr.aria-label]="ariaLabel()"></canvas></div>`,
  styles: `
    :host { display: block; }
    .frame { position: relative; height: var(--lw-chart-height, 280px); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class XyChart {
  readonly series = input.required<readonly XySeries[]>();
  readonly xLabel = input('');
  readonly yLabel = input('');
  readonly logX = input(false);
  readonly type = input<'line' | 'bar'>('line');
  readonly ariaLabel = input('Chart');

  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');
  private chart: Chart | undefined;
  private readonly theme = inject(ThemeMode);

  constructor() {
    inject(DestroyRef).onDestroy(() => this.chart?.destroy());
    effect(() => {
      const config = this.configuration(this.theme.isDark());
      if (!this.chart) {
        this.chart = new Chart(this.canvas().nativeElement, config);
        return;
      }
      this.chart.data = config.data;
      this.chart.options = config.options ?? {};
      this.chart.update('none');
    });
  }

  /** Canvas needs resolved colours; the theme's tokens are light-dark() expressions it cannot read. */
  private configuration(isDark: boolean): ChartConfiguration {
    const ink = isDark ? CHART_INK.dark : CHART_INK.light;
    const grid = isDark ? CHART_GRID.dark : CHART_GRID.light;
    const isBar = this.type() === 'bar';
    const datasets = this.series().map((series, index) => {
      const colour = SERIES_COLOURS[index % SERIES_COLOURS.length];
      return {
        label: series.label,
        data: isBar ? [...series.y] : series.x.map((x, i) => ({ x, y: series.y[i] })),
        borderColor: colour,
        backgroundColor: isBar ? `${colour}99` : colour,
        borderWidth: series.isReference ? 1.5 : 2,
        borderDash: series.isReference ? [6, 4] : [],
        pointRadius: 0,
        tension: 0,
      };
    });
    const labels = isBar ? this.series()[0]?.x.map((x) => x.toPrecision(4)) : undefined;
    return {
      type: this.type(),
      data: { labels, datasets } as ChartConfiguration['data'],
      options: {
        animation: false,
        responsive: true,
        maintainAspectRatio: false,
        interaction: { mode: 'nearest', intersect: false },
        plugins: { legend: { labels: { color: ink, boxWidth: 14 } }, tooltip: { enabled: true } },
        scales: {
          x: {
            type: isBar ? 'category' : this.logX() ? 'logarithmic' : 'linear',
            bounds: 'data',
            title: { display: !!this.xLabel(), text: this.xLabel(), color: ink },
            ticks: { color: ink, maxTicksLimit: 8 },
            grid: { color: grid },
          },
          y: {
            grace: '5%',
            title: { display: !!this.yLabel(), text: this.yLabel(), color: ink },
            ticks: { color: ink },
            grid: { color: grid },
          },
        },
      },
    } as ChartConfiguration;
  }
}
