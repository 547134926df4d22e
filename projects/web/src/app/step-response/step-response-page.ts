import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators, type ValidatorFn } from '@angular/forms';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTabsModule } from '@angular/material/tabs';
import {
  adviseTermination,
  calculate,
  DEFAULT_BAND,
  ESTIMATE_NOTE,
  kindLabel,
  stepResponse,
  thresholdCrossing,
  type LineSpec,
  type StepResponse,
  type TerminationAdvice,
  type TerminationScheme,
} from '@linewright/lines';
import { map } from 'rxjs';
import { LineTypesApi } from '../catalog/line-types-api';
import { Session } from '../core/session';
import { CurrentLine } from '../shared/current-line';
import { engineering } from '../shared/engineering-format';
import { XyChart } from '../shared/xy-chart';
import { BouncePanel } from './bounce-panel';
import { circuitFromInputs, INITIAL_UNITS, LOAD_KINDS, usesLoadCapacitance, usesLoadResistance, type CircuitInputs, type CircuitUnits, type LineSource, type LoadKind } from './circuit-inputs';
import { CABLE_LENGTH_UNITS, CAPACITANCE_UNITS, FREQUENCY_UNITS, TIME_UNITS } from './circuit-units';
import { LadderPanel } from './ladder-panel';
import { positive, ScaledField } from './scaled-field';
import { SCHEME_LABELS, terminationParts, TerminationTable } from './termination-table';
import { responseChart } from './time-series';

/** Samples per response: the lattice is exact at any count; this is what the plot and the threshold read. */
const POINTS = 2048;
/**
 * Above this amplitude the screen adds a caution about high-voltage and
 * RF-power cable work. Common practice, no source: 50 V is where many
 * electrical codes start treating circuits as more than extra-low voltage.
 */
export const HIGH_VOLTAGE_CAUTION = 50;

type Outcome = { response: StepResponse; problem?: undefined } | { response?: undefined; problem: string };
type AdviceOutcome = { rows: TerminationAdvice[]; problem?: undefined } | { rows?: undefined; problem: string };

const numberControl = (value: number | null, ...validators: ValidatorFn[]) => new FormControl<number | null>(value, validators);

@Component({
  selector: 'lw-step-response-page',
  imports: [
    ReactiveFormsModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatSelectModule,
    MatSlideToggleModule,
    MatTabsModule,
    XyChart,
    ScaledField,
    BouncePanel,
    TerminationTable,
    LadderPanel,
  ],
  templateUrl: './step-response-page.html',
  styleUrl: './step-response-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StepResponsePage {
  private readonly currentLine = inject(CurrentLine);
  private readonly lineTypes = inject(LineTypesApi);
  protected readonly session = inject(Session);

  protected readonly estimateNote = ESTIMATE_NOTE;
  protected readonly highVoltage = HIGH_VOLTAGE_CAUTION;
  protected readonly loadKinds = LOAD_KINDS;
  protected readonly schemeLabels = SCHEME_LABELS;
  protected readonly schemes = Object.keys(SCHEME_LABELS) as TerminationScheme[];
  protected readonly timeUnits = TIME_UNITS;
  protected readonly capacitanceUnits = CAPACITANCE_UNITS;
  protected readonly lengthUnits = CABLE_LENGTH_UNITS;
  protected readonly frequencyUnits = FREQUENCY_UNITS;
  protected readonly usesResistance = usesLoadResistance;
  protected readonly usesCapacitance = usesLoadCapacitance;

  protected readonly form = new FormGroup({
    amplitude: numberControl(3.3, Validators.required),
    sourceResistance: numberControl(10, Validators.required, Validators.min(0)),
    riseTime: numberControl(100, Validators.required, Validators.min(0)),
    lineSource: new FormControl<LineSource>('direct', { nonNullable: true }),
    z0: numberControl(50, Validators.required, positive),
    delay: numberControl(1, Validators.required, positive),
    isLossy: new FormControl(false, { nonNullable: true }),
    dcResistance: numberControl(0, Validators.min(0)),
    skinResistance: numberControl(2, Validators.min(0)),
    tanDelta: numberControl(0.02, Validators.min(0), Validators.max(0.999)),
    referenceFrequency: numberControl(1, positive),
    length: numberControl(0.15, Validators.required, positive),
    savedLineTypeId: new FormControl<number | null>(null),
    loadKind: new FormControl<LoadKind>('open', { nonNullable: true }),
    loadResistance: numberControl(50, Validators.required, Validators.min(0)),
    loadCapacitance: numberControl(5, Validators.required, Validators.min(0)),
    bandPercent: numberControl(DEFAULT_BAND * 100, Validators.required, positive, Validators.max(99)),
    threshold: numberControl(1.65),
  });

  protected readonly units = signal<CircuitUnits>(INITIAL_UNITS);
  protected readonly quantity = signal<'voltage' | 'current'>('voltage');
  protected readonly fitted = signal<TerminationScheme>('none');

  protected readonly inputs = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), {
    initialValue: this.form.getRawValue(),
  });

  /** The team's saved line types, read only when that source is chosen by someone signed in. */
  protected readonly savedList = rxResource({
    params: () => (this.inputs().lineSource === 'saved' && this.session.isSignedIn() ? true : undefined),
    stream: () => this.lineTypes.list({ page: 1, pageSize: 100, sort: 'name' }).pipe(map((page) => page.items)),
  });
  private readonly savedEntry = rxResource({
    params: () => (this.inputs().lineSource === 'saved' ? (this.inputs().savedLineTypeId ?? undefined) : undefined),
    stream: ({ params }) => this.lineTypes.get(params).pipe(map((answer) => answer.item)),
  });

  /** The cross-section behind the line when it does not come as Z0 and delay. */
  protected readonly spec = computed<LineSpec | undefined>(() => {
    const source = this.inputs().lineSource;
    if (source === 'calculator') return this.currentLine.spec();
    if (source === 'saved') return this.savedEntry.hasValue() ? this.savedEntry.value().computed?.spec : undefined;
    return undefined;
  });

  /** Z0 and delay per metre of a cross-section line, to show beside its length. */
  protected readonly specSummary = computed(() => {
    const spec = this.spec();
    if (!spec) return undefined;
    try {
      const result = calculate(spec);
      return { kind: kindLabel(spec.kind), z0: result.z0, delayPerMeter: result.delayPerMeter };
    } catch {
      // An incomplete spec has no summary; the circuit's own error names the field.
      return undefined;
    }
  });

  protected readonly band = computed(() => (this.inputs().bandPercent ?? DEFAULT_BAND * 100) / 100);
  protected readonly built = computed(() => circuitFromInputs(this.inputs() satisfies CircuitInputs, this.units(), this.spec()));
  protected readonly circuit = computed(() => this.built().circuit);

  private readonly options = computed(() => ({ band: this.band(), points: POINTS }));

  /** The circuit as entered, computed in the browser from the shared library on every change. */
  private readonly base = computed<Outcome>(() => {
    const built = this.built();
    if (!built.circuit) return { problem: built.problem };
    try {
      return { response: stepResponse(built.circuit, this.options()) };
    } catch (error) {
      // LineInputError names the field and the rule; the page shows it in place of a result.
      return { problem: messageOf(error) };
    }
  });

  /** The termination advisor: five solves, so only read when a termination is fitted or its table is open. */
  protected readonly advice = computed<AdviceOutcome | undefined>(() => {
    const circuit = this.circuit();
    if (!circuit) return undefined;
    try {
      return { rows: adviseTermination(circuit, this.options()) };
    } catch (error) {
      // An ideal step cannot drive the RC scheme's frequency-domain solve; the circuit's own result still stands.
      return { problem: messageOf(error) };
    }
  });

  /** What the plot, figures and diagram show: the circuit as entered, or with the fitted termination. */
  protected readonly outcome = computed<Outcome>(() => {
    const base = this.base();
    if (!base.response || this.fitted() === 'none') return base;
    return { response: this.fittedAdvice()?.response ?? base.response };
  });

  protected readonly fittedAdvice = computed(() => {
    const fitted = this.fitted();
    return fitted === 'none' ? undefined : this.advice()?.rows?.find((row) => row.scheme === fitted && row.isApplicable);
  });
  protected readonly fittedParts = computed(() => {
    const advice = this.fittedAdvice();
    return advice ? terminationParts(advice) : undefined;
  });

  protected readonly chart = computed(() => {
    const response = this.outcome().response;
    if (!response) return undefined;
    const threshold = this.inputs().threshold;
    return responseChart(response, {
      quantity: this.quantity(),
      threshold: threshold ?? undefined,
      band: this.band(),
      amplitude: this.inputs().amplitude ?? 0,
    });
  });

  protected readonly crossing = computed(() => {
    const response = this.outcome().response;
    const threshold = this.inputs().threshold;
    if (!response || threshold === null) return undefined;
    return thresholdCrossing(response, { end: 'load', threshold });
  });

  protected readonly firstLoadArrival = computed(() => this.outcome().response?.arrivals.find((arrival) => arrival.end === 'load'));

  /** Why the bounce diagram does not apply, in words, when it does not. */
  protected readonly latticeReason = computed(() => {
    const inputs = this.inputs();
    if (this.fitted() === 'rc') return 'The RC termination adds a capacitor at the load.';
    if (inputs.lineSource !== 'direct') return 'A line from its cross-section carries its conductor and dielectric loss.';
    if (inputs.isLossy) return 'The line has loss.';
    if (usesLoadCapacitance(inputs.loadKind)) return 'The load has a capacitor.';
    return '';
  });

  protected readonly isHighVoltage = computed(() => Math.abs(this.inputs().amplitude ?? 0) > HIGH_VOLTAGE_CAUTION);

  protected setUnit(field: keyof CircuitUnits, unit: string): void {
    this.units.update((units) => ({ ...units, [field]: unit }));
  }

  protected chooseSaved(id: number): void {
    this.form.controls.savedLineTypeId.setValue(id);
    const entry = this.savedList.value()?.find((item) => item.id === id);
    if (entry?.lengthDefault) {
      this.setUnit('length', 'm');
      this.form.controls.length.setValue(entry.lengthDefault);
    }
  }

  protected fit(scheme: TerminationScheme): void {
    this.fitted.set(scheme);
  }

  /** "3 round trips after the first arrival" on the lattice, when it settles. */
  protected roundTrips(response: StepResponse): string | undefined {
    const trips = response.roundTripsToSettle;
    if (trips === null || !Number.isFinite(trips)) return undefined;
    return `${trips} round trip${trips === 1 ? '' : 's'} after the first arrival`;
  }

  protected time(seconds: number | null | undefined): string {
    if (seconds === null || seconds === undefined) return 'never';
    return Number.isFinite(seconds) ? engineering(seconds, 's') : 'never';
  }

  protected volts(value: number): string {
    return engineering(value, 'V');
  }

  protected ohms(value: number): string {
    return engineering(value, 'Ω');
  }

  protected delayPerLength(secondsPerMeter: number): string {
    return `${engineering(secondsPerMeter * 1e-3, 's', 3)}/mm`;
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
