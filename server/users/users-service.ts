/** Team administration: list members, change a role, deactivate an account. */
import { Problem } from '../errors';
import type { Actor } from '../auth/principal';
import type { Role, User, UsersRepository } from './users-repository';

export class TeamMembers {
  constructor(private readonly users: UsersRepository) {}

  list(): Promise<User[]> {
    return this.users.list();
  }

  async update(actor: Actor, id: number, changes: { role?: Role; isActive?: boolean; name?: string }): Promise<User> {
    const user = await this.users.findById(id);
    if (!user) throw Problem.notFound('No user with this id.');
    const losesAdmin = user.role === 'admin' && ((changes.role && changes.role !== 'admin') || changes.isActive === false);
    // The team must keep at least one active admin, or nobody could approve or invite again.
    if (losesAdmin && (id === actor.userId || (await this.users.countActiveAdmins()) <= 1)) {
      throw Problem.conflict('This would leave the team without an active admin (or demote yourself); ask another admin.');
    }
    await this.users.update(id, changes);
    return (await this.users.findById(id))!;
  }
}
