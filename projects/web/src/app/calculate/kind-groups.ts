import { lineKinds, type LineKind, type LineKindDescription } from '@linewright/lines';

export interface KindGroup {
  label: string;
  kinds: LineKindDescription[];
}

/** How the kind picker groups the library's kinds: wires and cables, board traces, pairs. */
const GROUPS: readonly { label: string; kinds: readonly LineKind[] }[] = [
  { label: 'Board traces', kinds: ['microstrip', 'embedded-microstrip', 'stripline', 'offset-stripline', 'cpw'] },
  { label: 'Differential pairs', kinds: ['coupled-microstrip', 'coupled-stripline'] },
  { label: 'Wires and cables', kinds: ['coax', 'twin-lead', 'twisted-pair', 'wire-over-ground'] },
];

export const KIND_GROUPS: readonly KindGroup[] = GROUPS.map((group) => ({
  label: group.label,
  kinds: group.kinds.map((kind) => lineKinds.find((entry) => entry.kind === kind)).filter((entry) => entry !== undefined),
})).filter((group) => group.kinds.length > 0);
