import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { outputFromObservable, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import type { CrossSectionOptions, FieldLineResult, LineKind, LineResult, LineSpec, TableUnit } from '@linewright/lines';
import { EMPTY, Subject, debounceTime, filter, map, merge, of, scan, switchMap } from 'rxjs';
import { trimmed } from '../../shared/engineering-format';
import { unitFactor } from '../../shared/unit-choices';
import { FieldSolver } from './field-solver';
import { PotentialPicture } from './potential-picture';

type Etch = 'none' | 'top-width' | 'angle';
type RunState =
  | { status: 'idle' }
  | { status: 'running'; fraction: number; cells: number }
  | { status: 'done'; result: FieldLineResult; millis: number; formula: LineResult | undefined }
  | { status: 'failed'; message: string };

const SURFACE_KINDS: readonly LineKind[] = ['microstrip', 'coupled-microstrip', 'cpw'];
const BURIED_KINDS: readonly LineKind[] = ['stripline', 'offset-stripline', 'coupled-stripline'];
const WIRE_KINDS: readonly LineKind[] = ['coax', 'twin-lead', 'wire-over-ground', 'twisted-pair'];
/** Solve to 0.5 % estimated error within 5 s (the bench shows typical sections well under 1 s). */
const TOLERANCE = 0.005;
const MAX_MILLIS = 5000;
const RERUN_DELAY_MS = 400;

interface ComparedRow {
  label: string;
  formula?: number;
  field?: number;
  unit: string;
}

/** "Check with the field solver": the section as drawn (or etched, coated, mixed), solved in a Web Worker beside the formula. */
@Component({
  selector: 'lw-field-check-panel',
  imports: [MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSlideToggleModule, PotentialPicture],
  templateUrl: './field-check-panel.html',
  styleUrl: './field-check-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FieldCheckPanel {
  readonly spec = input<LineSpec | undefined>();
  readonly formula = input<LineResult | undefined>();
  readonly lengthUnit = input<TableUnit>('mm');
  private readonly solver = inject(FieldSolver);

  protected readonly etch = signal<Etch>('none');
  protected readonly topWidth = signal<number | null>(null);
  protected readonly etchAngleDeg = signal(60);
  protected readonly hasCoating = signal(false);
  protected readonly coatingThickness = signal(0.02);
  protected readonly coatingEr = signal(3.5);
  protected readonly erAbove = signal<number | null>(null);
  protected readonly rerunsAsYouType = signal(false);

  private readonly kind = computed(() => this.spec()?.kind);
  protected readonly canEtch = computed(() => !!this.kind() && !WIRE_KINDS.includes(this.kind()!));
  protected readonly canCoat = computed(() => !!this.kind() && SURFACE_KINDS.includes(this.kind()!));
  protected readonly canMixBuried = computed(() => !!this.kind() && BURIED_KINDS.includes(this.kind()!));
  protected readonly unitLabel = computed(() => (this.lengthUnit() === 'um' ? 'µm' : this.lengthUnit()));

  protected readonly section = computed<CrossSectionOptions>(() => {
    const options: CrossSectionOptions = {};
    const factor = unitFactor(this.lengthUnit());
    if (this.canEtch() && this.etch() === 'top-width' && this.topWidth()) options.stripTopWidth = this.topWidth()! * factor;
    if (this.canEtch() && this.etch() === 'angle') options.etchAngle = (this.etchAngleDeg() * Math.PI) / 180;
    if (this.canCoat() && this.hasCoating()) options.coating = { thickness: this.coatingThickness() * factor, relativePermittivity: this.coatingEr() };
    if (this.canMixBuried() && this.erAbove()) options.erAbove = this.erAbove()!;
    return options;
  });
  protected readonly isIdealised = computed(() => Object.keys(this.section()).length === 0);
  /** The edited section, so the page's drawing shows the etch and coating too. */
  readonly sectionChange = outputFromObservable(toObservable(this.section));

  private readonly runs = new Subject<void>();
  private readonly cancels = new Subject<void>();
  private readonly request = computed(() => ({ spec: this.spec(), section: this.section(), formula: this.formula() }));

  protected readonly state = toSignal(
    merge(
      this.runs.pipe(map(() => 'run' as const)),
      this.cancels.pipe(map(() => 'cancel' as const)),
      toObservable(this.request).pipe(
        debounceTime(RERUN_DELAY_MS),
        filter(() => this.rerunsAsYouType()),
        map(() => 'run' as const),
      ),
    ).pipe(
      switchMap((command) => {
        const { spec, section, formula } = this.request();
        if (command === 'cancel' || !spec) return of<RunState>({ status: 'idle' });
        return this.solver.solve({ spec, section, tolerance: TOLERANCE, maxMillis: MAX_MILLIS }).pipe(
          scan<unknown, RunState>((_, message) => {
            const answer = message as import('./field-solve-messages').FieldSolveMessage;
            if (answer.type === 'progress') return { status: 'running', fraction: answer.fraction, cells: answer.cells };
            if (answer.type === 'error') return { status: 'failed', message: answer.message };
            return { status: 'done', result: answer.result, millis: answer.millis, formula };
          }, { status: 'running', fraction: 0, cells: 0 }),
        );
      }),
    ),
    { initialValue: { status: 'idle' } as RunState },
  );

  protected readonly rows = computed<ComparedRow[]>(() => {
    const state = this.state();
    if (state.status !== 'done') return [];
    const { result, formula } = state;
    const rows: ComparedRow[] = [];
    if (result.zDiff !== undefined && formula?.zDiff !== undefined) {
      rows.push(
        { label: 'Differential Z', formula: formula.zDiff, field: result.zDiff, unit: 'Ω' },
        { label: 'Odd-mode Z', formula: formula.zOdd, field: result.zOdd, unit: 'Ω' },
        { label: 'Even-mode Z', formula: formula.zEven, field: result.zEven, unit: 'Ω' },
      );
    } else {
      rows.push({ label: 'Z0', formula: formula?.z0, field: result.z0, unit: 'Ω' });
    }
    rows.push({ label: 'εeff', formula: formula?.erEff, field: result.erEff, unit: '' });
    return rows;
  });

  protected run(): void {
    this.runs.next();
  }

  protected cancel(): void {
    this.cancels.next();
  }

  protected number(text: string): number | null {
    const value = Number(text);
    return text.trim() === '' || !Number.isFinite(value) ? null : value;
  }

  protected shown(value: number | undefined, unit: string): string {
    return value === undefined ? '—' : `${trimmed(value, 5)}${unit ? ` ${unit}` : ''}`;
  }

  protected difference(row: ComparedRow): string {
    if (row.formula === undefined || row.field === undefined) return '—';
    const percent = ((row.formula - row.field) / row.field) * 100;
    return `${percent >= 0 ? '+' : '−'}${trimmed(Math.abs(percent), 3)} %`;
  }

  protected percent(value: number): string {
    return `${trimmed(value * 100, 2)} %`;
  }
}
