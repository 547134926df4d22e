/**
 * Candidates travel in the URL (`?lines=…`) so a comparison can be shared:
 * JSON of [{ name, spec }] in base64url. Anything that does not decode to
 * valid specs is dropped rather than trusted.
 */
import { validateSpec, type LineSpec } from '@linewright/lines';

export interface Candidate {
  name: string;
  spec: LineSpec;
}

export const MAX_CANDIDATES = 4;

function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = '';
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return btoa(binary).replaceAll('+', '-').replaceAll('/', '_').replace(/=+$/, '');
}

function fromBase64Url(encoded: string): string {
  const binary = atob(encoded.replaceAll('-', '+').replaceAll('_', '/'));
  return new TextDecoder().decode(Uint8Array.from(binary, (character) => character.charCodeAt(0)));
}

export function encodeCandidates(candidates: readonly Candidate[]): string {
  return toBase64Url(JSON.stringify(candidates.map(({ name, spec }) => ({ name, spec }))));
}

export function decodeCandidates(encoded: string | null | undefined): Candidate[] {
  if (!encoded) return [];
  let parsed: unknown;
  try {
    parsed = JSON.parse(fromBase64Url(encoded));
  } catch {
    // A truncated or hand-edited link: start from an empty comparison rather than fail.
    return [];
  }
  if (!Array.isArray(parsed)) return [];
  const candidates: Candidate[] = [];
  for (const entry of parsed.slice(0, MAX_CANDIDATES)) {
    const { name, spec } = (entry ?? {}) as { name?: unknown; spec?: unknown };
    try {
      validateSpec(spec as LineSpec);
    } catch {
      // An invalid spec in a shared link is skipped; the rest of the comparison still opens.
      continue;
    }
    candidates.push({ name: typeof name === 'string' ? name.slice(0, 80) : `Line ${candidates.length + 1}`, spec: spec as LineSpec });
  }
  return candidates;
}
