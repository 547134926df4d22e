/**
 * The public shapes of the lines library. Every quantity is SI: metres, hertz,
 * siemens per metre, ohms, seconds, farads and henries per metre.
 */

/** Fields every line kind accepts. */
export interface CommonLineFields {
  /** Relative permittivity (Dk) of the dielectric, ≥ 1. */
  er: number;
  /** Dielectric loss tangent (Df), ≥ 0. */
  tanDelta?: number;
  /** Frequency for losses and dispersion [Hz]. */
  frequency?: number;
  /** Physical length for totals (delay, loss, electrical length) [m]. */
  length?: number;
  /** Conductor conductivity [S/m]; default annealed copper. */
  conductivity?: number;
  /** RMS surface roughness of the conductor [m]. */
  roughness?: number;
  /** Picks an alternative published method where a kind offers several. */
  method?: string;
  /**
   * Roughness model for conductor loss: 'hammerstad-bekkadal' (default, uses
   * `roughness`) or 'huray' (uses `noduleRadius` and `noduleSurfaceRatio`).
   */
  roughnessModel?: 'hammerstad-bekkadal' | 'huray';
  /** Huray model: radius of the copper nodules ("snowballs") [m]. */
  noduleRadius?: number;
  /** Huray model: total nodule surface per unit of flat surface, N·4πa²/A_flat (dimensionless). */
  noduleSurfaceRatio?: number;
  /**
   * When given, `er` and `tanDelta` are the values measured at this frequency [Hz]
   * and the Djordjevic–Sarkar wideband causal model carries them to `frequency`.
   */
  dielectricReferenceFrequency?: number;
}

export interface CoaxSpec extends CommonLineFields {
  kind: 'coax';
  /** Inner conductor diameter [m]. */
  d: number;
  /** Inner diameter of the shield [m]. */
  D: number;
  /** Dielectric strength of the insulation [V/m], for the voltage/power estimate. */
  dielectricStrength?: number;
}

export interface TwinLeadSpec extends CommonLineFields {
  kind: 'twin-lead';
  /** Wire diameter [m]. */
  d: number;
  /** Centre-to-centre spacing [m]. */
  s: number;
}

export interface WireOverGroundSpec extends CommonLineFields {
  kind: 'wire-over-ground';
  /** Wire diameter [m]. */
  d: number;
  /** Height of the wire's centre above the plane [m]. */
  h: number;
}

export interface TwistedPairSpec extends CommonLineFields {
  kind: 'twisted-pair';
  d: number;
  s: number;
  /** Twists per metre of pair length [1/m]. */
  twistsPerMeter: number;
}

export interface MicrostripSpec extends CommonLineFields {
  kind: 'microstrip';
  /** Strip width [m]. */
  w: number;
  /** Dielectric height [m]. */
  h: number;
  /** Strip thickness [m]. */
  t: number;
}

export interface EmbeddedMicrostripSpec extends CommonLineFields {
  kind: 'embedded-microstrip';
  w: number;
  h: number;
  t: number;
  /** Dielectric thickness above the substrate surface [m]. */
  cover: number;
  /** Relative permittivity of the cover; defaults to er. */
  erCover?: number;
}

export interface StriplineSpec extends CommonLineFields {
  kind: 'stripline';
  w: number;
  /** Plane-to-plane spacing [m]. */
  b: number;
  t: number;
}

export interface OffsetStriplineSpec extends CommonLineFields {
  kind: 'offset-stripline';
  w: number;
  /** Gap from the lower plane to the strip [m]. */
  h1: number;
  /** Gap from the strip to the upper plane [m]. */
  h2: number;
  t: number;
}

export interface CpwSpec extends CommonLineFields {
  kind: 'cpw';
  /** Centre strip width [m]. */
  w: number;
  /** Gap to each coplanar ground [m]. */
  g: number;
  /** Substrate height [m]. */
  h: number;
  t: number;
  /** Conductor-backed (ground plane under the substrate). */
  grounded?: boolean;
}

export interface CoupledMicrostripSpec extends CommonLineFields {
  kind: 'coupled-microstrip';
  w: number;
  /** Edge-to-edge gap [m]. */
  s: number;
  h: number;
  t: number;
}

export interface CoupledStriplineSpec extends CommonLineFields {
  kind: 'coupled-stripline';
  w: number;
  s: number;
  b: number;
  t: number;
}

export type LineSpec =
  | CoaxSpec
  | TwinLeadSpec
  | WireOverGroundSpec
  | TwistedPairSpec
  | MicrostripSpec
  | EmbeddedMicrostripSpec
  | StriplineSpec
  | OffsetStriplineSpec
  | CpwSpec
  | CoupledMicrostripSpec
  | CoupledStriplineSpec;

export type LineKind = LineSpec['kind'];

/** A published method and where it comes from. */
export interface MethodInfo {
  name: string;
  citation: string;
}

export interface ComplexValue {
  re: number;
  im: number;
}

export interface LineResult {
  z0: number;
  erEff: number;
  /** [s/m] */
  delayPerMeter: number;
  velocityFactor: number;
  /** [H/m] */
  lPerMeter: number;
  /** [F/m] */
  cPerMeter: number;
  method: MethodInfo;
  warnings: string[];

  // With `frequency`:
  rPerMeter?: number;
  gPerMeter?: number;
  /** [Np/m] */
  alphaConductor?: number;
  /** [Np/m] */
  alphaDielectric?: number;
  lossDbPerMeter?: number;
  skinDepth?: number;
  zc?: ComplexValue;

  // With `length`:
  delay?: number;
  lossDb?: number;
  electricalLengthDeg?: number;

  // With `frequency` and `dielectricReferenceFrequency` (wideband dielectric):
  /** Relative permittivity at `frequency`. */
  erAtFrequency?: number;
  /** Loss tangent at `frequency`. */
  tanDeltaAtFrequency?: number;

  // Coax:
  /** TE11 cut-off frequency: above it the coax is no longer single-mode [Hz]. */
  cutoffFrequency?: number;
  /** With `dielectricStrength`: peak voltage at which the field at the inner conductor reaches it [V]. */
  peakVoltage?: number;
  /** With `dielectricStrength`: matched CW power at that peak voltage, no margin, no heating limit [W]. */
  maxPower?: number;

  // Coupled kinds (erEff, delay, L, C, R, G, losses and zc then describe the odd, i.e. differential, mode):
  zOdd?: number;
  zEven?: number;
  zDiff?: number;
  zCommon?: number;
  erEffOdd?: number;
  erEffEven?: number;
}
