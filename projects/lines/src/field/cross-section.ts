/**
 * The transverse cross-section the field solver works on: the document type the
 * screen's editor edits and `crossSectionFromSpec` produces. Coordinates are in
 * metres, x across the board, y up from the lowest reference plane. The section
 * is uniform along the line (z), so the quasi-static problem is 2D.
 */

/** An axis-aligned rectangle. `left`/`right` may be ±Infinity to reach the side walls (layers, ground pour). */
export interface RectangleShape {
  shape: 'rectangle';
  left: number;
  right: number;
  bottom: number;
  top: number;
}

/**
 * An etched trace: a trapezoid with a horizontal base and top, symmetric about
 * `centerX`. A rectangle is the case bottomWidth = topWidth; a top narrower
 * than the base is the usual etch profile.
 */
export interface TrapezoidShape {
  shape: 'trapezoid';
  centerX: number;
  bottom: number;
  top: number;
  bottomWidth: number;
  topWidth: number;
}

/** A round wire, or round insulation when used as a dielectric region. */
export interface CircleShape {
  shape: 'circle';
  centerX: number;
  centerY: number;
  radius: number;
}

export type Shape = RectangleShape | TrapezoidShape | CircleShape;

/** A conductor along the line. Every `signal` conductor gets its own row of the capacitance matrix; `ground` ones are the 0 V reference. */
export interface SectionConductor {
  role: 'signal' | 'ground';
  shape: Shape;
  /** Label for the screen and reports, e.g. 'strip', 'left strip'. */
  name?: string;
}

/** A dielectric region. Regions are painted in order over the background, so a later region wins where two overlap; conductors win over every dielectric. */
export interface DielectricRegion {
  relativePermittivity: number;
  shape: Shape;
  name?: string;
}

/** Solid reference planes, infinite in x: everything below `bottom` and above `top` is ground metal. */
export interface GroundPlanes {
  bottom?: number;
  top?: number;
}

/**
 * A cross-section for `fieldSolve`.
 * Without an `enclosure` the section is open: the solver closes it with a
 * grounded box far away (see `OPEN_BOUNDARY_DISTANCE` in domain.ts).
 */
export interface CrossSection {
  conductors: SectionConductor[];
  dielectrics: DielectricRegion[];
  /** Relative permittivity wherever no dielectric region lies; default 1 (air). */
  backgroundPermittivity?: number;
  groundPlanes?: GroundPlanes;
  /** A grounded shield: everything outside this rectangle or circle is ground metal (a shielding box, a coax braid). */
  enclosure?: RectangleShape | CircleShape;
}
