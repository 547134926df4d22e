import { ChangeDetectionStrategy, Component, inject, signal, viewChild } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { LENGTH_CHOICES } from '../shared/unit-choices';
import { Session, type FormLengthUnit } from '../core/session';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { AccountApi } from './account-api';
import { NewPasswordFields } from './new-password-fields';
import { NEW_PASSWORD_VALIDATORS, samePasswords } from './password-rules';
import { TokensPanel } from './tokens-panel';

@Component({
  selector: 'lw-account-page',
  imports: [ReactiveFormsModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatInputModule, NewPasswordFields, TokensPanel],
  template: `
    <section class="lw-page">
      @if (session.user(); as user) {
        <header>
          <h1>{{ user.name }}</h1>
          <p class="lead">{{ user.email }} · <span class="lw-state-chip" data-state="approved">{{ user.role }}</span></p>
        </header>
        <div class="grid">
          <div class="lw-card">
            <h2 id="units-title">Units</h2>
            <p class="lead">Length fields start in this unit; each field can still switch on its own.</p>
            <mat-button-toggle-group aria-labelledby="units-title" [value]="session.preferredLengthUnit()" (change)="setUnit($event.value)" [disabled]="isSavingUnit()" hideSingleSelectionIndicator>
              @for (unit of lengthUnits; track unit.id) {
                <mat-button-toggle [value]="unit.id">{{ unit.label }}</mat-button-toggle>
              }
            </mat-button-toggle-group>
          </div>
          <form class="lw-card lw-form" [formGroup]="password" (ngSubmit)="changePassword()" aria-labelledby="password-title">
            <h2 id="password-title">Password</h2>
            <mat-form-field appearance="outline">
              <mat-label>Current password</mat-label>
              <input matInput type="password" formControlName="current" autocomplete="current-password" required />
              <mat-error>{{ errorText(password.controls.current) }}</mat-error>
            </mat-form-field>
            <lw-new-password-fields [group]="password" />
            @if (isPasswordChanged()) { <p role="status" class="done">Changed. Your other sessions have ended; this one carries on.</p> }
            <div class="lw-actions"><button mat-stroked-button type="submit" [disabled]="isChangingPassword()">Change the password</button></div>
          </form>
        </div>
        <lw-tokens-panel [role]="user.role" />
      }
    </section>
  `,
  styles: `
    .grid { display: grid; grid-template-columns: repeat(auto-fit, minmax(300px, 1fr)); gap: 16px; align-items: start; }
    .done { color: var(--lw-good); margin: 0; }
    mat-button-toggle-group { align-self: flex-start; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountPage {
  protected readonly session = inject(Session);
  private readonly api = inject(AccountApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly errorText = errorText;
  protected readonly lengthUnits = LENGTH_CHOICES;
  protected readonly isSavingUnit = signal(false);
  protected readonly isChangingPassword = signal(false);
  protected readonly isPasswordChanged = signal(false);
  private readonly passwordForm = viewChild(FormGroupDirective);
  protected readonly password = inject(NonNullableFormBuilder).group(
    { current: ['', Validators.required], password: ['', NEW_PASSWORD_VALIDATORS], repeat: [''] },
    { validators: samePasswords },
  );

  protected async setUnit(unit: FormLengthUnit): Promise<void> {
    this.isSavingUnit.set(true);
    try {
      await this.session.setPreferredLengthUnit(unit);
    } catch (error) {
      this.problems.report(error);
    } finally {
      this.isSavingUnit.set(false);
    }
  }

  protected async changePassword(): Promise<void> {
    this.password.markAllAsTouched();
    this.isPasswordChanged.set(false);
    if (this.password.invalid || this.isChangingPassword()) return;
    this.isChangingPassword.set(true);
    try {
      const { current, password } = this.password.getRawValue();
      await firstValueFrom(this.api.changePassword(current, password));
      this.passwordForm()?.resetForm();
      this.isPasswordChanged.set(true);
    } catch (error) {
      this.problems.report(error, this.password, { currentPassword: 'current', newPassword: 'password' });
    } finally {
      this.isChangingPassword.set(false);
    }
  }
}
