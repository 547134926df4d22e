/**
 * Which actions a person sees on a catalog entry, from its state and their
 * role — the same life cycle the server enforces (server/catalog/catalog-states.ts):
 * engineers edit and propose drafts; admins approve, send back, retire and
 * reinstate; engineers delete their own drafts, admins any unused entry.
 */
import type { User } from '../core/auth-api';
import { hasRole } from '../core/session';
import type { CatalogEntry, CatalogState } from './catalog-types';

export type EntryAction =
  | { kind: 'edit'; label: string; icon: string }
  | { kind: 'state'; label: string; icon: string; to: CatalogState }
  | { kind: 'delete'; label: string; icon: string };

const MOVES: readonly { from: CatalogState; to: CatalogState; label: string; icon: string; isAdminOnly: boolean }[] = [
  { from: 'draft', to: 'proposed', label: 'Propose for approval', icon: 'outgoing_mail', isAdminOnly: false },
  { from: 'proposed', to: 'approved', label: 'Approve', icon: 'verified', isAdminOnly: true },
  { from: 'proposed', to: 'draft', label: 'Send back to draft', icon: 'undo', isAdminOnly: true },
  { from: 'draft', to: 'retired', label: 'Retire', icon: 'archive', isAdminOnly: true },
  { from: 'proposed', to: 'retired', label: 'Retire', icon: 'archive', isAdminOnly: true },
  { from: 'approved', to: 'retired', label: 'Retire', icon: 'archive', isAdminOnly: true },
  { from: 'retired', to: 'approved', label: 'Reinstate', icon: 'unarchive', isAdminOnly: true },
];

export function entryActions(entry: CatalogEntry, user: User | null | undefined): EntryAction[] {
  if (!hasRole(user, 'engineer')) return [];
  const isAdmin = hasRole(user, 'admin');
  const actions: EntryAction[] = [];
  if (entry.state === 'draft') actions.push({ kind: 'edit', label: 'Edit', icon: 'edit' });
  for (const move of MOVES) {
    if (move.from === entry.state && (isAdmin || !move.isAdminOnly)) actions.push({ kind: 'state', label: move.label, icon: move.icon, to: move.to });
  }
  const isOwnDraft = entry.state === 'draft' && entry.createdBy === user!.id;
  if (isAdmin || isOwnDraft) actions.push({ kind: 'delete', label: 'Delete', icon: 'delete' });
  return actions;
}
