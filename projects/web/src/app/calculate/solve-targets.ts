import type { OutputQuantity } from '@linewright/lines';

/** A quantity the calculator can solve for, with the unit its target is typed in. */
export interface SolveTargetChoice {
  quantity: OutputQuantity;
  label: string;
  unit: string;
  /** Typed value × factor = SI. */
  factor: number;
  /** A common target to start from (common practice, no source). */
  typical: number;
}

const PS_PER_MM = 1e-9;

const SINGLE: readonly SolveTargetChoice[] = [
  { quantity: 'z0', label: 'Z0', unit: 'Ω', factor: 1, typical: 50 },
  { quantity: 'delayPerMeter', label: 'Delay per length', unit: 'ps/mm', factor: PS_PER_MM, typical: 6 },
  { quantity: 'erEff', label: 'εeff', unit: '', factor: 1, typical: 3 },
];

const COUPLED: readonly SolveTargetChoice[] = [
  { quantity: 'zDiff', label: 'Differential Z', unit: 'Ω', factor: 1, typical: 100 },
  { quantity: 'zOdd', label: 'Odd-mode Z', unit: 'Ω', factor: 1, typical: 50 },
  { quantity: 'zCommon', label: 'Common-mode Z', unit: 'Ω', factor: 1, typical: 30 },
  { quantity: 'z0', label: 'Z0 = √(Zodd·Zeven)', unit: 'Ω', factor: 1, typical: 55 },
  { quantity: 'delayPerMeter', label: 'Delay per length', unit: 'ps/mm', factor: PS_PER_MM, typical: 6 },
];

export function solveTargets(isCoupled: boolean): readonly SolveTargetChoice[] {
  return isCoupled ? COUPLED : SINGLE;
}
