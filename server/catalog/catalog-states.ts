/**
 * The life of a catalog entry: draft → proposed → approved → retired.
 * Engineers write drafts and propose them; an admin approves, sends back,
 * retires and reinstates. Only drafts are edited: an approved entry is what
 * designs rely on, so changing it means a new draft.
 */
import { Problem } from '../errors';
import { hasRole } from '../auth/principal';
import type { Role } from '../users/users-repository';

export const CATALOG_STATES = ['draft', 'proposed', 'approved', 'retired'] as const;
export type CatalogState = (typeof CATALOG_STATES)[number];

interface Transition {
  from: CatalogState;
  to: CatalogState;
  least: Role;
}

const TRANSITIONS: readonly Transition[] = [
  { from: 'draft', to: 'proposed', least: 'engineer' },
  { from: 'proposed', to: 'draft', least: 'admin' },
  { from: 'proposed', to: 'approved', least: 'admin' },
  { from: 'draft', to: 'retired', least: 'admin' },
  { from: 'proposed', to: 'retired', least: 'admin' },
  { from: 'approved', to: 'retired', least: 'admin' },
  { from: 'retired', to: 'approved', least: 'admin' },
];

/** Throws 409 for a move the life cycle does not have, 403 for one the role may not make. */
export function checkTransition(from: CatalogState, to: CatalogState, role: Role): void {
  const transition = TRANSITIONS.find((candidate) => candidate.from === from && candidate.to === to);
  if (!transition) {
    const allowed = TRANSITIONS.filter((candidate) => candidate.from === from).map((candidate) => candidate.to);
    throw Problem.conflict(`An entry in state ${from} can move to ${allowed.join(' or ') || 'no other state'}, not to ${to}.`);
  }
  if (!hasRole(role, transition.least)) throw Problem.forbidden(`Moving an entry from ${from} to ${to} needs the ${transition.least} role.`);
}

export function checkEditable(state: CatalogState, role: Role): void {
  if (!hasRole(role, 'engineer')) throw Problem.forbidden('Editing the catalog needs the engineer role or higher.');
  if (state !== 'draft') throw Problem.conflict(`Only drafts can be edited; this entry is ${state}. Create a new draft instead.`);
}
