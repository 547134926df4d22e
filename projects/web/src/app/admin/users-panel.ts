import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { rxResource } from '@angular/core/rxjs-interop';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { ROLES, type Role, type User } from '../core/auth-api';
import { toApiProblem } from '../core/api-problem';
import { ProblemDisplay } from '../core/problem-display';
import { Session } from '../core/session';
import { AdminApi } from './admin-api';

/** Every account with its role and active flag; the server keeps at least one admin. */
@Component({
  selector: 'lw-users-panel',
  imports: [DatePipe, MatButtonModule, MatFormFieldModule, MatProgressSpinnerModule, MatSelectModule, MatSlideToggleModule, MatTableModule],
  template: `
    @if (users.isLoading() && !users.hasValue()) {
      <div class="lw-state"><mat-spinner diameter="28" aria-label="Loading members" /></div>
    } @else if (users.error()) {
      <div class="lw-state is-error" role="alert">{{ loadProblem() }} <button mat-button type="button" (click)="users.reload()">Try again</button></div>
    } @else if ((users.value() ?? []).length === 0) {
      <div class="lw-state">No members yet.</div>
    } @else {
      <div class="lw-table-wrap">
        <table mat-table [dataSource]="users.value() ?? []" aria-label="Members">
          <ng-container matColumnDef="name">
            <th mat-header-cell *matHeaderCellDef>Name</th>
            <td mat-cell *matCellDef="let user">{{ user.name }}@if (user.id === session.user()?.id) { <span class="you">(you)</span> }</td>
          </ng-container>
          <ng-container matColumnDef="email">
            <th mat-header-cell *matHeaderCellDef>E-mail</th>
            <td mat-cell *matCellDef="let user">{{ user.email }}</td>
          </ng-container>
          <ng-container matColumnDef="role">
            <th mat-header-cell *matHeaderCellDef>Role</th>
            <td mat-cell *matCellDef="let user">
              <mat-form-field appearance="outline" subscriptSizing="dynamic" class="role">
                <mat-select [aria-label]="'Role of ' + user.name" [value]="user.role" (selectionChange)="setRole(user, $event.value)" [disabled]="busyId() === user.id">
                  @for (role of roles; track role) { <mat-option [value]="role">{{ role }}</mat-option> }
                </mat-select>
              </mat-form-field>
            </td>
          </ng-container>
          <ng-container matColumnDef="isActive">
            <th mat-header-cell *matHeaderCellDef>Active</th>
            <td mat-cell *matCellDef="let user">
              <mat-slide-toggle [checked]="user.isActive" (change)="setActive(user, $event.checked)" [disabled]="busyId() === user.id"
                                [aria-label]="'Account of ' + user.name + ' active'" />
            </td>
          </ng-container>
          <ng-container matColumnDef="createdAt">
            <th mat-header-cell *matHeaderCellDef>Since</th>
            <td mat-cell *matCellDef="let user">{{ user.createdAt | date: 'mediumDate' }}</td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
      </div>
    }
  `,
  styles: `
    :host { display: block; padding-top: 16px; }
    .role { width: 150px; margin: 4px 0; }
    .you { color: var(--mat-sys-on-surface-variant); margin-left: 4px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UsersPanel {
  private readonly api = inject(AdminApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly session = inject(Session);
  protected readonly roles = ROLES;
  protected readonly columns = ['name', 'email', 'role', 'isActive', 'createdAt'];
  protected readonly users = rxResource({ stream: () => this.api.users() });
  protected readonly loadProblem = computed(() => toApiProblem(this.users.error()).message);
  protected readonly busyId = signal<number | undefined>(undefined);

  protected setRole(user: User, role: Role): Promise<void> {
    return this.change(user, { role }, `${user.name} is now ${role}.`);
  }

  protected setActive(user: User, isActive: boolean): Promise<void> {
    return this.change(user, { isActive }, `${user.name} is ${isActive ? 'active again' : 'deactivated and signed out'}.`);
  }

  private async change(user: User, changes: Partial<User>, done: string): Promise<void> {
    this.busyId.set(user.id);
    try {
      const updated = await firstValueFrom(this.api.updateUser(user.id, changes));
      this.users.update((users) => users?.map((entry) => (entry.id === updated.id ? updated : entry)));
      this.problems.notify(done);
    } catch (error) {
      this.problems.report(error);
      // The select and toggle show what was asked; reloading shows what the server kept.
      this.users.reload();
    } finally {
      this.busyId.set(undefined);
    }
  }
}
