import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, untracked, type WritableSignal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { ESTIMATE_NOTE, calculate, lineKind, solve, type CrossSectionOptions, type LineKind, type LineResult, type LineSpec } from '@linewright/lines';
import { catchError, debounceTime, map, of, startWith, switchMap } from 'rxjs';
import { QuantityField } from '../shared/quantity-field';
import { CurrentLine } from '../shared/current-line';
import { Session } from '../core/session';
import { CalculateApi } from './calculate-api';
import { KIND_GROUPS } from './kind-groups';
import { buildLineForm, initialUnit, isFieldInUse, specFromForm, type LineForm, type SurfaceModel, type UnitMap } from './line-form';
import { LineReadout } from './line-readout';
import { ServerCheck, type ServerCheckState } from './server-check';
import { CrossSectionDrawing } from '../shared/section-drawing/cross-section-drawing';
import { MatTabsModule } from '@angular/material/tabs';
import { MatInputModule } from '@angular/material/input';
import { solveTargets } from './solve-targets';
import { SweepPanel } from './sweep-panel';
import { SpreadPanel } from './spread-panel';
import { HandOffPanel } from './hand-off-panel';
import { FieldCheckPanel } from './field-check/field-check-panel';
import { CatalogPick } from './catalog-pick';
import type { Conductor, Material } from '../catalog/catalog-types';
import { unitFactor } from '../shared/unit-choices';
import { trimmed } from '../shared/engineering-format';

type Outcome = { result: LineResult; spec: LineSpec; solved?: number; error?: undefined } | { result?: undefined; spec?: undefined; solved?: undefined; error: string };

const FIELD_GROUPS = [
  { id: 'geometry', label: 'Cross-section' },
  { id: 'material', label: 'Dielectric and conductor' },
  { id: 'operating', label: 'Frequency and length' },
] as const;

/** Debounce before asking the server to confirm: the live result never waits for it. */
const SERVER_CHECK_DELAY_MS = 400;

@Component({
  selector: 'lw-calculate-page',
  imports: [
    ReactiveFormsModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatSlideToggleModule,
    MatTabsModule,
    QuantityField,
    LineReadout,
    ServerCheck,
    CrossSectionDrawing,
    SweepPanel,
    SpreadPanel,
    HandOffPanel,
    FieldCheckPanel,
    CatalogPick,
  ],
  templateUrl: './calculate-page.html',
  styleUrl: './calculate-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CalculatePage {
  private readonly api = inject(CalculateApi);
  private readonly currentLine = inject(CurrentLine);
  private readonly session = inject(Session);
  protected readonly kindGroups = KIND_GROUPS;
  protected readonly fieldGroups = FIELD_GROUPS;
  protected readonly estimateNote = ESTIMATE_NOTE;

  protected readonly kind = signal<LineKind>('microstrip');
  protected readonly description = computed(() => lineKind(this.kind()));

  /** One state per kind, kept so switching back and forth keeps what was typed. */
  private readonly states = new Map<LineKind, KindState>();
  private readonly state = computed(() => {
    const kind = this.kind();
    return untracked(() => this.stateFor(kind));
  });
  protected readonly form = computed(() => this.state().form);
  protected readonly units = computed(() => this.state().units());
  protected readonly flags = computed(() => this.state().flags());
  protected readonly method = computed(() => this.state().method());
  protected readonly surface = signal<SurfaceModel>('smooth');
  protected readonly surfaceModels: readonly { id: SurfaceModel; label: string }[] = [
    { id: 'smooth', label: 'Smooth' },
    { id: 'hammerstad-bekkadal', label: 'RMS roughness (Hammerstad–Bekkadal)' },
    { id: 'huray', label: 'Nodules (Huray)' },
  ];

  private readonly values = toSignal(
    toObservable(this.form).pipe(switchMap((form) => form.valueChanges.pipe(startWith(form.getRawValue()), map(() => form.getRawValue())))),
    { initialValue: {} as Record<string, number | null> },
  );

  /** "Solve for": the input that becomes the unknown, and the target it must meet. */
  protected readonly unknown = signal<string | undefined>(undefined);
  protected readonly targets = computed(() => solveTargets(this.description().isCoupled));
  protected readonly targetQuantity = signal<string>('z0');
  protected readonly targetValue = signal<number | null>(50);
  protected readonly target = computed(() => this.targets().find((choice) => choice.quantity === this.targetQuantity()) ?? this.targets()[0]);
  protected readonly solvableFields = computed(() =>
    this.description().fields.filter((field) => field.quantity !== 'boolean' && !field.isOptional),
  );

  /** The spec as typed; with an unknown, its value is only the solver's starting point. */
  private readonly typedSpec = computed<LineSpec | undefined>(() =>
    specFromForm(this.description(), this.values(), this.units(), { flags: this.flags(), method: this.method(), surface: this.surface() }, this.unknown()),
  );

  /** Computed in the browser from the shared library on every change. */
  protected readonly outcome = computed<Outcome | undefined>(() => {
    const spec = this.typedSpec();
    if (!spec) return undefined;
    const unknown = this.unknown();
    const targetValue = this.targetValue();
    try {
      if (!unknown) return { result: calculate(spec), spec };
      if (targetValue === null || !Number.isFinite(targetValue)) return { error: 'Enter the target value to solve for.' };
      const solution = solve(spec, unknown, { quantity: this.target().quantity, value: targetValue * this.target().factor });
      return { result: solution.result, spec: solution.spec, solved: solution.value };
    } catch (error) {
      // The library throws a typed error naming the field (or the unreachable target); show it instead of a result.
      return { error: error instanceof Error ? error.message : String(error) };
    }
  });

  /** Etch and coating from the field-solver tab, drawn in the cross-section too. */
  protected readonly sectionOptions = signal<CrossSectionOptions>({});

  /** The complete spec behind the shown result (with a solved unknown filled in). */
  protected readonly spec = computed(() => this.outcome()?.spec);
  protected readonly lengthUnit = computed(() => {
    const unit = this.units()['w'] ?? this.units()['d'] ?? 'mm';
    return unit === '' || unit === 'oz' ? 'mm' : unit;
  });

  protected readonly serverCheck = toSignal(
    toObservable(this.spec).pipe(
      debounceTime(SERVER_CHECK_DELAY_MS),
      switchMap((spec): import('rxjs').Observable<ServerCheckState> => {
        if (!spec) return of({ status: 'idle' });
        return this.api.calculate(spec).pipe(
          map((answer) => ({ status: 'answered' as const, result: answer.result })),
          catchError(() => of({ status: 'unreachable' as const })),
          startWith({ status: 'pending' as const }),
        );
      }),
    ),
    { initialValue: { status: 'idle' } as ServerCheckState },
  );

  constructor() {
    // Compare and step response can start from the line on this screen.
    effect(() => {
      const spec = this.spec();
      if (spec) this.currentLine.spec.set(spec);
    });
  }

  protected fieldsIn(group: string) {
    const surface = this.surface();
    return this.description().fields.filter((field) => field.group === group && field.quantity !== 'boolean' && isFieldInUse(field, surface));
  }

  protected toggles() {
    return this.description().fields.filter((field) => field.quantity === 'boolean');
  }

  protected selectKind(kind: LineKind): void {
    this.unknown.set(undefined);
    this.kind.set(kind);
    this.targetQuantity.set(this.targets()[0].quantity);
    this.targetValue.set(this.targets()[0].typical);
  }

  protected setUnknown(field: string | undefined): void {
    this.unknown.set(field || undefined);
  }

  protected setTargetQuantity(quantity: string): void {
    this.targetQuantity.set(quantity);
    this.targetValue.set(this.target().typical);
  }

  protected setTargetValue(text: string): void {
    this.targetValue.set(text === '' ? null : Number(text));
  }

  /** Fills Dk, Df and the frequency they were measured at from a catalog material. */
  protected useMaterial(material: Material): void {
    this.fill({ er: material.dk, tanDelta: material.df, dielectricReferenceFrequency: material.referenceFrequency });
  }

  /** Fills conductivity and RMS roughness from a catalog conductor. */
  protected useConductor(conductor: Conductor): void {
    if (conductor.roughness > 0) this.surface.set('hammerstad-bekkadal');
    this.fill({ conductivity: conductor.conductivity, roughness: conductor.roughness > 0 ? conductor.roughness : undefined });
  }

  /** Writes SI values into the form in each field's shown unit. */
  private fill(values: Record<string, number | undefined>): void {
    for (const [name, value] of Object.entries(values)) {
      const control = this.form().controls[name];
      if (!control || value === undefined) continue;
      control.setValue(Number(trimmed(value / unitFactor(this.units()[name] ?? ''), 6)));
    }
  }

  protected setMethod(method: string): void {
    this.state().method.set(method);
  }

  protected setUnit(field: string, unit: UnitMap[string]): void {
    this.state().units.update((units) => ({ ...units, [field]: unit }));
  }

  protected setFlag(field: string, value: boolean): void {
    this.state().flags.update((flags) => ({ ...flags, [field]: value }));
  }

  private stateFor(kind: LineKind): KindState {
    let state = this.states.get(kind);
    if (!state) {
      const description = lineKind(kind);
      // A kind's fields start in the account's preferred length unit (mm until the session is known).
      const preferred = this.session.preferredLengthUnit();
      const units = signal<UnitMap>(Object.fromEntries(description.fields.map((field) => [field.name, initialUnit(field, preferred)])));
      state = {
        units,
        flags: signal({}),
        method: signal(description.methods[0]?.id),
        form: buildLineForm(description, units(), (field) => units()[field] ?? ''),
      };
      this.states.set(kind, state);
    }
    return state;
  }
}

interface KindState {
  form: LineForm;
  units: WritableSignal<UnitMap>;
  flags: WritableSignal<Record<string, boolean>>;
  method: WritableSignal<string | undefined>;
}
