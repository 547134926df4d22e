import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { Router } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatMenuModule } from '@angular/material/menu';
import { catchError, map, of, switchMap } from 'rxjs';
import { LineTypesApi } from '../catalog/line-types-api';
import { Session } from '../core/session';
import { Clipboard } from '@angular/cdk/clipboard';
import { ESTIMATE_NOTE, calculate, lineKind, sweep, type LineResult, type LineSpec, type TableUnit } from '@linewright/lines';
import { CurrentLine } from '../shared/current-line';
import { trimmed } from '../shared/engineering-format';
import { XyChart, type XySeries } from '../shared/xy-chart';
import { CandidateCard } from './candidate-card';
import { MAX_CANDIDATES, decodeCandidates, encodeCandidates, type Candidate } from './candidates-url';
import { comparisonRows } from './comparison-rows';

const STARTERS: readonly Candidate[] = [
  { name: 'Outer-layer microstrip', spec: { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.2, tanDelta: 0.02, frequency: 1e9 } },
  { name: 'Inner-layer stripline', spec: { kind: 'stripline', w: 0.15e-3, b: 0.5e-3, t: 17.4e-6, er: 4.2, tanDelta: 0.02, frequency: 1e9 } },
];

type Overlay = 'impedance' | 'loss' | 'delay';
const LENGTH_UNITS: readonly { id: TableUnit; label: string }[] = [
  { id: 'mm', label: 'mm' },
  { id: 'mil', label: 'mil' },
  { id: 'um', label: 'µm' },
];
const SWEEP_POINTS = 120;
const FREQUENCY_RANGE = [1e7, 2e10] as const;

/** Two to four candidate lines side by side, differences read against the first, with overlaid sweeps. */
@Component({
  selector: 'lw-compare-page',
  imports: [MatButtonModule, MatButtonToggleModule, MatIconModule, MatMenuModule, MatSelectModule, MatFormFieldModule, CandidateCard, XyChart],
  templateUrl: './compare-page.html',
  styleUrl: './compare-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComparePage {
  /** The `lines` query parameter (bound by the router). */
  readonly lines = input<string | undefined>();
  private readonly router = inject(Router);
  private readonly clipboard = inject(Clipboard);
  private readonly currentLine = inject(CurrentLine);
  private readonly lineTypes = inject(LineTypesApi);
  protected readonly session = inject(Session);

  /** The team's saved line types, for signed-in users; undefined while loading or when the catalog cannot be read. */
  protected readonly savedTypes = toSignal(
    toObservable(this.session.isSignedIn).pipe(
      switchMap((isSignedIn) =>
        isSignedIn
          ? this.lineTypes.list({ page: 1, pageSize: 100, sort: 'name' }).pipe(
              map((page) => page.items),
              // The menu says the catalog could not be read; the comparison itself goes on.
              catchError(() => of([])),
            )
          : of(undefined),
      ),
    ),
  );

  protected readonly estimateNote = ESTIMATE_NOTE;
  protected readonly lengthUnits = LENGTH_UNITS;
  protected readonly maxCandidates = MAX_CANDIDATES;
  protected readonly lengthUnit = signal<TableUnit>('mm');
  protected readonly overlay = signal<Overlay>('impedance');
  protected readonly isLinkCopied = signal(false);
  protected readonly candidates = signal<Candidate[]>([]);
  protected readonly hasCurrentLine = computed(() => this.currentLine.spec() !== undefined);

  protected readonly evaluated = computed(() =>
    this.candidates().map((candidate) => {
      try {
        return { result: calculate(candidate.spec) as LineResult | undefined, error: undefined as string | undefined };
      } catch (error) {
        // An impossible candidate stays on screen with its message; the others are still compared.
        return { result: undefined, error: error instanceof Error ? error.message : String(error) };
      }
    }),
  );
  protected readonly rows = computed(() => comparisonRows(this.evaluated().map((entry) => entry.result)));

  protected readonly chart = computed(() => {
    const overlay = this.overlay();
    const series: XySeries[] = [];
    this.candidates().forEach((candidate, index) => {
      if (!this.evaluated()[index]?.result) return;
      const spec = overlay === 'loss' ? { ...candidate.spec, frequency: candidate.spec.frequency ?? 1e9 } : candidate.spec;
      const run = sweep(spec, 'frequency', FREQUENCY_RANGE[0], FREQUENCY_RANGE[1], SWEEP_POINTS, { spacing: 'log' });
      const x = run.x.map((hertz) => hertz / 1e9);
      const y = overlay === 'loss' ? (run.series.lossDbPerMeter ?? []) : overlay === 'delay' ? run.series.delayPerMeter.map((value) => value * 1e9) : (run.series.zDiff ?? run.series.z0);
      series.push({ label: `${index + 1}. ${candidate.name}`, x, y });
    });
    const yLabel = overlay === 'loss' ? 'Loss [dB/m]' : overlay === 'delay' ? 'Delay [ps/mm]' : 'Impedance (Z0, or differential for pairs) [Ω]';
    return { series, yLabel };
  });

  constructor() {
    // The URL is the comparison's source on arrival; afterwards every edit is written back so the link can be shared.
    effect(() => {
      const fromUrl = decodeCandidates(this.lines());
      untracked(() => {
        if (encodeCandidates(this.candidates()) === this.lines() && this.candidates().length > 0) return;
        this.candidates.set(fromUrl.length > 0 ? fromUrl : this.startingCandidates());
      });
    });
    effect(() => {
      const encoded = encodeCandidates(this.candidates());
      if (this.candidates().length > 0 && encoded !== untracked(() => this.lines())) {
        void this.router.navigate([], { queryParams: { lines: encoded }, replaceUrl: true });
      }
    });
  }

  protected update(index: number, candidate: Candidate): void {
    this.candidates.update((list) => list.map((entry, i) => (i === index ? candidate : entry)));
  }

  protected remove(index: number): void {
    this.candidates.update((list) => list.filter((_, i) => i !== index));
  }

  protected addCopyOfLast(): void {
    this.candidates.update((list) => {
      const last = list[list.length - 1] ?? STARTERS[0];
      return [...list, { name: `${last.name} (copy)`, spec: { ...last.spec } }];
    });
  }

  protected addCurrentLine(): void {
    const spec = this.currentLine.spec();
    if (spec) this.candidates.update((list) => [...list, { name: `From the calculator (${lineKind(spec.kind).label})`, spec }]);
  }

  protected addSavedType(id: number): void {
    this.lineTypes.get(id).subscribe(({ item }) => {
      const spec = item.computed?.spec;
      if (spec) this.candidates.update((list) => (list.length < MAX_CANDIDATES ? [...list, { name: item.name, spec }] : list));
    });
  }

  protected copyLink(): void {
    const url = new URL(this.router.url, location.origin).toString();
    this.isLinkCopied.set(this.clipboard.copy(url));
  }

  protected cellText(value: number | undefined): string {
    return value === undefined ? '—' : trimmed(value, 4);
  }

  protected differenceText(difference: number | undefined): string {
    if (difference === undefined) return '';
    const percent = difference * 100;
    return `${percent >= 0 ? '+' : '−'}${trimmed(Math.abs(percent), 2)} %`;
  }

  private startingCandidates(): Candidate[] {
    const current = this.currentLine.spec();
    return current ? [{ name: 'From the calculator', spec: current }, STARTERS[1]] : [...STARTERS];
  }
}
