/** How catalog quantities read in tables and dialogs (SI in, units always shown). */
import { engineering, trimmed } from '../shared/engineering-format';

export const GHZ = 1e9;
/** Dielectric strength is quoted per millimetre on data sheets: 1 kV/mm = 1e6 V/m. */
export const KV_PER_MM = 1e6;
/** Conductivity reads best in MS/m (copper ≈ 58). */
export const MS_PER_M = 1e6;
export const MICROMETRE = 1e-6;

export const frequencyText = (hertz: number) => engineering(hertz, 'Hz', 4);
export const strengthText = (voltsPerMetre: number | null) => (voltsPerMetre === null ? '—' : `${trimmed(voltsPerMetre / KV_PER_MM, 3)} kV/mm`);
export const conductivityText = (siemensPerMetre: number) => `${trimmed(siemensPerMetre / MS_PER_M, 4)} MS/m`;
export const micrometreText = (metres: number) => `${trimmed(metres / MICROMETRE, 3)} µm`;
export const updatedText = (iso: string) => new Date(iso).toLocaleDateString(undefined, { year: 'numeric', month: 'short', day: 'numeric' });
