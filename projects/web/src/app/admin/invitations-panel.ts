import { ChangeDetectionStrategy, Component, computed, inject, signal, viewChild } from '@angular/core';
import { DatePipe } from '@angular/common';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { rxResource } from '@angular/core/rxjs-interop';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { ROLES, type Role } from '../core/auth-api';
import { toApiProblem } from '../core/api-problem';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { AdminApi, type Invitation } from './admin-api';

@Component({
  selector: 'lw-invitations-panel',
  imports: [DatePipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressSpinnerModule, MatSelectModule, MatTableModule],
  template: `
    <form class="lw-form-row invite" [formGroup]="form" (ngSubmit)="invite()" aria-label="Invite someone">
      <mat-form-field appearance="outline">
        <mat-label>E-mail to invite</mat-label>
        <input matInput type="email" formControlName="email" required />
        <mat-hint>They get a link, valid seven days, to choose a name and password.</mat-hint>
        <mat-error>{{ errorText(form.controls.email) }}</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline" class="role">
        <mat-label>Role</mat-label>
        <mat-select formControlName="role">
          @for (role of roles; track role) { <mat-option [value]="role">{{ role }}</mat-option> }
        </mat-select>
      </mat-form-field>
      <div class="invite-action"><button mat-flat-button type="submit" [disabled]="isSending()"><mat-icon>send</mat-icon>Invite</button></div>
    </form>
    @if (invitations.isLoading() && !invitations.hasValue()) {
      <div class="lw-state"><mat-spinner diameter="28" aria-label="Loading invitations" /></div>
    } @else if (invitations.error()) {
      <div class="lw-state is-error" role="alert">{{ loadProblem() }} <button mat-button type="button" (click)="invitations.reload()">Try again</button></div>
    } @else if ((invitations.value() ?? []).length === 0) {
      <div class="lw-state">No open invitations.</div>
    } @else {
      <div class="lw-table-wrap">
        <table mat-table [dataSource]="invitations.value() ?? []" aria-label="Open invitations">
          <ng-container matColumnDef="email">
            <th mat-header-cell *matHeaderCellDef>E-mail</th>
            <td mat-cell *matCellDef="let invitation">{{ invitation.email }}</td>
          </ng-container>
          <ng-container matColumnDef="role">
            <th mat-header-cell *matHeaderCellDef>Role</th>
            <td mat-cell *matCellDef="let invitation">{{ invitation.role }}</td>
          </ng-container>
          <ng-container matColumnDef="expiresAt">
            <th mat-header-cell *matHeaderCellDef>Link valid until</th>
            <td mat-cell *matCellDef="let invitation">{{ invitation.expiresAt | date: 'medium' }}</td>
          </ng-container>
          <ng-container matColumnDef="actions">
            <th mat-header-cell *matHeaderCellDef><span class="lw-visually-hidden">Actions</span></th>
            <td mat-cell *matCellDef="let invitation">
              <button mat-button type="button" (click)="revoke(invitation)" [attr.aria-label]="'Revoke the invitation of ' + invitation.email"><mat-icon>block</mat-icon>Revoke</button>
            </td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
      </div>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; padding-top: 16px; }
    .invite { align-items: flex-start; }
    .invite .role { flex: 0 1 160px; }
    .invite-action { flex: 0 0 auto; padding-top: 8px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvitationsPanel {
  private readonly api = inject(AdminApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly errorText = errorText;
  protected readonly roles = ROLES;
  protected readonly columns = ['email', 'role', 'expiresAt', 'actions'];
  protected readonly invitations = rxResource({ stream: () => this.api.invitations() });
  protected readonly loadProblem = computed(() => toApiProblem(this.invitations.error()).message);
  protected readonly isSending = signal(false);
  private readonly formDirective = viewChild.required(FormGroupDirective);
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    role: ['engineer' as Role, Validators.required],
  });

  protected async invite(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isSending()) return;
    this.isSending.set(true);
    try {
      const { email, role } = this.form.getRawValue();
      await firstValueFrom(this.api.invite(email.trim(), role));
      this.problems.notify(`Invited ${email} as ${role}.`);
      this.formDirective().resetForm({ email: '', role });
      this.invitations.reload();
    } catch (error) {
      this.problems.report(error, this.form);
    } finally {
      this.isSending.set(false);
    }
  }

  protected async revoke(invitation: Invitation): Promise<void> {
    try {
      await firstValueFrom(this.api.revokeInvitation(invitation.id));
      this.problems.notify(`The invitation of ${invitation.email} no longer works.`);
      this.invitations.reload();
    } catch (error) {
      this.problems.report(error);
    }
  }
}
