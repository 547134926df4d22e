import type { User } from '../core/auth-api';
import { entryActions } from './catalog-actions';
import type { CatalogEntry, CatalogState } from './catalog-types';

const user = (id: number, role: User['role']): User => ({ id, email: `${role}@halden.test`, name: role, role, preferences: {}, isActive: true });
const entry = (state: CatalogState, createdBy = 2): CatalogEntry => ({ id: 9, name: 'Core A', state, version: 1, createdBy, updatedBy: createdBy, createdAt: '', updatedAt: '' });
const labels = (state: CatalogState, who: User | null, createdBy?: number) => entryActions(entry(state, createdBy), who).map((action) => action.label);

describe('entryActions', () => {
  it('offers a viewer and a signed-out visitor nothing', () => {
    expect(labels('draft', user(3, 'viewer'))).toEqual([]);
    expect(labels('draft', null)).toEqual([]);
  });

  it('lets an engineer edit, propose and delete their own draft', () => {
    expect(labels('draft', user(2, 'engineer'))).toEqual(['Edit', 'Propose for approval', 'Delete']);
  });

  it('does not let an engineer delete a colleague\'s draft, nor approve anything', () => {
    expect(labels('draft', user(2, 'engineer'), 5)).toEqual(['Edit', 'Propose for approval']);
    expect(labels('proposed', user(2, 'engineer'))).toEqual([]);
  });

  it('lets an admin approve or send back a proposal, retire and reinstate', () => {
    expect(labels('proposed', user(1, 'admin'))).toEqual(['Approve', 'Send back to draft', 'Retire', 'Delete']);
    expect(labels('approved', user(1, 'admin'))).toEqual(['Retire', 'Delete']);
    expect(labels('retired', user(1, 'admin'))).toEqual(['Reinstate', 'Delete']);
  });
});
