/**
 * Which figures the readout shows for a result, in what order and unit. Pure,
 * so the client's unit tests check the numbers without rendering.
 */
import type { LineResult } from '@linewright/lines';
import { engineering, trimmed } from '../shared/engineering-format';

export interface ReadoutRow {
  id: string;
  label: string;
  value: string;
  /** A second reading of the same figure in another unit. */
  alternate?: string;
}

/** dB per neper, 20·log10(e). */
const DB_PER_NEPER = 20 / Math.LN10;
const INCH = 0.0254;

export function headlineRows(result: LineResult, isCoupled: boolean): ReadoutRow[] {
  if (isCoupled && result.zDiff !== undefined) {
    return [
      { id: 'zDiff', label: 'Differential impedance', value: `${trimmed(result.zDiff, 4)} Ω` },
      { id: 'zCommon', label: 'Common-mode impedance', value: `${trimmed(result.zCommon ?? Number.NaN, 4)} Ω` },
    ];
  }
  return [{ id: 'z0', label: 'Characteristic impedance Z0', value: `${trimmed(result.z0, 4)} Ω` }];
}

export function detailRows(result: LineResult, isCoupled: boolean): ReadoutRow[] {
  const rows: ReadoutRow[] = [];
  if (isCoupled && result.zOdd !== undefined) {
    rows.push(
      { id: 'zOdd', label: 'Odd-mode impedance', value: `${trimmed(result.zOdd, 4)} Ω` },
      { id: 'zEven', label: 'Even-mode impedance', value: `${trimmed(result.zEven ?? Number.NaN, 4)} Ω` },
      { id: 'erEffOdd', label: 'εeff, odd mode', value: trimmed(result.erEffOdd ?? Number.NaN, 4) },
      { id: 'erEffEven', label: 'εeff, even mode', value: trimmed(result.erEffEven ?? Number.NaN, 4) },
    );
  }
  rows.push(
    { id: 'erEff', label: 'Effective permittivity εeff', value: trimmed(result.erEff, 4) },
    {
      id: 'delayPerMeter',
      label: 'Delay per length',
      value: `${trimmed(result.delayPerMeter * 1e9, 4)} ps/mm`,
      alternate: `${trimmed(result.delayPerMeter * INCH * 1e12, 4)} ps/in`,
    },
    { id: 'velocityFactor', label: 'Velocity factor', value: `${trimmed(result.velocityFactor, 4)} c` },
    { id: 'lPerMeter', label: 'Inductance per length', value: engineering(result.lPerMeter, 'H/m') },
    { id: 'cPerMeter', label: 'Capacitance per length', value: engineering(result.cPerMeter, 'F/m') },
  );
  if (result.lossDbPerMeter !== undefined) {
    rows.push(
      { id: 'rPerMeter', label: 'Resistance per length', value: engineering(result.rPerMeter ?? Number.NaN, 'Ω/m') },
      { id: 'gPerMeter', label: 'Conductance per length', value: engineering(result.gPerMeter ?? Number.NaN, 'S/m') },
      { id: 'alphaConductor', label: 'Conductor loss', value: `${trimmed((result.alphaConductor ?? Number.NaN) * DB_PER_NEPER, 4)} dB/m` },
      { id: 'alphaDielectric', label: 'Dielectric loss', value: `${trimmed((result.alphaDielectric ?? Number.NaN) * DB_PER_NEPER, 4)} dB/m` },
      {
        id: 'lossDbPerMeter',
        label: 'Total loss',
        value: `${trimmed(result.lossDbPerMeter, 4)} dB/m`,
        alternate: `${trimmed(result.lossDbPerMeter * INCH, 4)} dB/in`,
      },
      { id: 'skinDepth', label: 'Skin depth', value: engineering(result.skinDepth ?? Number.NaN, 'm') },
    );
    if (result.zc) {
      const sign = result.zc.im < 0 ? '−' : '+';
      rows.push({ id: 'zc', label: 'Complex Zc at frequency', value: `${trimmed(result.zc.re, 4)} ${sign} j${trimmed(Math.abs(result.zc.im), 3)} Ω` });
    }
  }
  if (result.delay !== undefined) {
    rows.push({ id: 'delay', label: 'Delay over the length', value: engineering(result.delay, 's') });
    if (result.lossDb !== undefined) rows.push({ id: 'lossDb', label: 'Loss over the length', value: `${trimmed(result.lossDb, 4)} dB` });
    if (result.electricalLengthDeg !== undefined) {
      rows.push({ id: 'electricalLengthDeg', label: 'Electrical length', value: `${trimmed(result.electricalLengthDeg, 4)}°` });
    }
  }
  return rows;
}
