import { ChangeDetectionStrategy, Component, computed, inject, signal, untracked, type WritableSignal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { ESTIMATE_NOTE, calculate, lineKind, type LineKind, type LineResult, type LineSpec } from '@linewright/lines';
import { catchError, debounceTime, map, of, startWith, switchMap } from 'rxjs';
import { QuantityField } from '../shared/quantity-field';
import { CalculateApi } from './calculate-api';
import { KIND_GROUPS } from './kind-groups';
import { buildLineForm, initialUnit, specFromForm, type LineForm, type UnitMap } from './line-form';
import { LineReadout } from './line-readout';
import { ServerCheck, type ServerCheckState } from './server-check';

type Outcome = { result: LineResult; error?: undefined } | { result?: undefined; error: string };

const FIELD_GROUPS = [
  { id: 'geometry', label: 'Cross-section' },
  { id: 'material', label: 'Dielectric and conductor' },
  { id: 'operating', label: 'Frequency and length' },
] as const;

/** Debounce before asking the server to confirm: the live result never waits for it. */
const SERVER_CHECK_DELAY_MS = 400;

@Component({
  selector: 'lw-calculate-page',
  imports: [ReactiveFormsModule, MatCardModule, MatFormFieldModule, MatSelectModule, MatSlideToggleModule, QuantityField, LineReadout, ServerCheck],
  templateUrl: './calculate-page.html',
  styleUrl: './calculate-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CalculatePage {
  private readonly api = inject(CalculateApi);
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

  private readonly values = toSignal(
    toObservable(this.form).pipe(switchMap((form) => form.valueChanges.pipe(startWith(form.getRawValue()), map(() => form.getRawValue())))),
    { initialValue: {} as Record<string, number | null> },
  );

  protected readonly spec = computed<LineSpec | undefined>(() =>
    specFromForm(this.description(), this.values(), this.units(), this.flags(), this.method()),
  );

  /** Computed in the browser from the shared library on every change. */
  protected readonly outcome = computed<Outcome | undefined>(() => {
    const spec = this.spec();
    if (!spec) return undefined;
    try {
      return { result: calculate(spec) };
    } catch (error) {
      // The library throws a typed error naming the field; show it instead of a result.
      return { error: error instanceof Error ? error.message : String(error) };
    }
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

  protected fieldsIn(group: string) {
    return this.description().fields.filter((field) => field.group === group && field.quantity !== 'boolean');
  }

  protected toggles() {
    return this.description().fields.filter((field) => field.quantity === 'boolean');
  }

  protected selectKind(kind: LineKind): void {
    this.kind.set(kind);
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
      const units = signal<UnitMap>(Object.fromEntries(description.fields.map((field) => [field.name, initialUnit(field)])));
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
