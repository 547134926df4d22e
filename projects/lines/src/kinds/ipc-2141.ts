/**
 * The quick formulas printed in IPC-2141A, "Design Guide for High-Speed
 * Controlled Impedance Circuit Boards", 2004 (coefficients recalled from
 * memory, not checked against the text). Offered as an alternative `method`
 * so users can see why a quick formula disagrees with the accurate models:
 * they are several per cent off outside a narrow range.
 */
import { SPEED_OF_LIGHT } from '../constants';
import type { ValidityRange } from '../validation';

export const IPC_2141 = {
  name: 'IPC-2141A quick formula',
  citation: 'IPC-2141A, Design Guide for High-Speed Controlled Impedance Circuit Boards, IPC, 2004',
};

export const IPC_MICROSTRIP_VALIDITY: readonly ValidityRange[] = [
  { quantity: 'w/h', min: 0.1, max: 2, method: IPC_2141.name },
  { quantity: 'er', min: 1, max: 15, method: IPC_2141.name },
];

export const IPC_STRIPLINE_VALIDITY: readonly ValidityRange[] = [
  { quantity: 'w/b', min: 0, max: 0.35, method: IPC_2141.name },
  { quantity: 't/b', min: 0, max: 0.25, method: IPC_2141.name },
];

/** Propagation delay of the microstrip quick formula: 85 ps per inch times √(0.475εr + 0.67). */
const MICROSTRIP_DELAY_PER_INCH = 85e-12;
const METRES_PER_INCH = 0.0254;

/**
 * Surface microstrip, quick estimate: Z0 = 87/√(εr + 1.41)·ln(5.98h/(0.8w + t)) [Ω],
 * εeff from the delay formula tpd = 85 ps/in·√(0.475εr + 0.67).
 * Method: IPC-2141A (2004), surface microstrip.
 * Valid:  0.1 < w/h < 2, 1 < εr < 15; a few per cent inside, much worse outside.
 */
export function ipcMicrostrip(w: number, h: number, t: number, er: number): { z0: number; erEff: number } {
  const delayPerMeter = (MICROSTRIP_DELAY_PER_INCH / METRES_PER_INCH) * Math.sqrt(0.475 * er + 0.67);
  return {
    z0: (87 / Math.sqrt(er + 1.41)) * Math.log((5.98 * h) / (0.8 * w + t)),
    erEff: (delayPerMeter * SPEED_OF_LIGHT) ** 2,
  };
}

/**
 * Centred stripline, quick estimate: Z0 = 60/√εr·ln(1.9b/(0.8w + t)) [Ω]
 * (the same as 60/√εr·ln(4b/(0.67π(0.8w + t)))); εeff = εr (homogeneous).
 * Method: IPC-2141A (2004), symmetric stripline.
 * Valid:  w/b < 0.35, t/b < 0.25.
 */
export function ipcStripline(w: number, b: number, t: number, er: number): { z0: number; erEff: number } {
  return { z0: (60 / Math.sqrt(er)) * Math.log((1.9 * b) / (0.8 * w + t)), erEff: er };
}
