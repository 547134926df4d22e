import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { tolerance, type FieldDescription, type LineSpec, type Spreads } from '@linewright/lines';
import { XyChart } from '../shared/xy-chart';
import { trimmed } from '../shared/engineering-format';
import { unitFactor } from '../shared/unit-choices';
import type { UnitMap } from './line-form';

/** Samples drawn while the user types; the library's bench holds 2,000 inside one frame. */
const LIVE_SAMPLES = 2000;

/** Typical ± spreads in per cent (common practice, no source): editable to the fabricator's figures. */
const TYPICAL_PERCENT: Record<string, number> = { t: 15, er: 5 };
const DEFAULT_PERCENT = 10;

/** Fabrication spread: Monte Carlo histogram, worst-case corners and sensitivities, live. */
@Component({
  selector: 'lw-spread-panel',
  imports: [MatFormFieldModule, MatInputModule, XyChart],
  templateUrl: './spread-panel.html',
  styleUrl: './spread-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpreadPanel {
  readonly spec = input<LineSpec | undefined>();
  readonly fields = input.required<readonly FieldDescription[]>();
  readonly isCoupled = input(false);
  readonly units = input<UnitMap>({});

  private readonly edited = signal<Record<string, number>>({});
  protected readonly samples = LIVE_SAMPLES;

  /** Inputs a fabricator's process spreads: the geometry and the dielectric constant. */
  protected readonly spreadable = computed(() =>
    this.fields().filter((field) => (field.group === 'geometry' && field.quantity === 'length' && !field.isOptional) || field.name === 'er'),
  );

  protected readonly percents = computed(() =>
    Object.fromEntries(this.spreadable().map((field) => [field.name, this.edited()[field.name] ?? TYPICAL_PERCENT[field.name] ?? DEFAULT_PERCENT])),
  );

  protected readonly study = computed(() => {
    const spec = this.spec();
    if (!spec) return undefined;
    const spreads: Spreads = {};
    for (const [field, percent] of Object.entries(this.percents())) {
      const nominal = (spec as unknown as Record<string, number>)[field];
      // A zero nominal (t = 0, the thin-strip limit) has nothing to spread.
      if (percent > 0 && typeof nominal === 'number' && nominal > 0) spreads[field] = { plusMinusRelative: percent / 100 };
    }
    try {
      return { result: tolerance(spec, spreads, LIVE_SAMPLES, { bins: 24 }), error: undefined };
    } catch (error) {
      // A spread can reach impossible geometry (e.g. a gap below zero); report it rather than chart half a study.
      return { result: undefined, error: error instanceof Error ? error.message : String(error) };
    }
  });

  protected readonly histogram = computed(() => {
    const result = this.study()?.result;
    if (!result) return [];
    const { edges, counts } = result.impedance.histogram;
    const centres = counts.map((_, i) => (edges[i] + edges[i + 1]) / 2);
    return [{ label: `${this.impedanceLabel()} samples`, x: centres, y: counts }];
  });

  protected readonly impedanceLabel = computed(() => (this.study()?.result?.impedanceQuantity === 'zDiff' ? 'Differential Z' : 'Z0'));

  protected labelOf(field: string): string {
    return this.fields().find((candidate) => candidate.name === field)?.label ?? field;
  }

  protected setPercent(field: string, text: string): void {
    const value = Number(text);
    if (Number.isFinite(value) && value >= 0 && value < 100) this.edited.update((edited) => ({ ...edited, [field]: value }));
  }

  protected ohms(value: number): string {
    return `${trimmed(value, 4)} Ω`;
  }

  protected picosecondsPerMm(value: number): string {
    return `${trimmed(value * 1e9, 4)} ps/mm`;
  }

  /** ∂Z/∂input per shown unit of the input (Ω per mm, per mil …). */
  protected perShownUnit(field: string, perSi: number): string {
    const unit = this.units()[field] ?? '';
    const label = unit === '' ? '' : ` per ${unit === 'um' ? 'µm' : unit}`;
    return `${trimmed(perSi * unitFactor(unit), 3)} Ω${label}`;
  }
}
