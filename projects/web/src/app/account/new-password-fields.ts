import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ReactiveFormsModule, type FormControl, type FormGroup } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { errorText } from '../core/form-errors';


/** A new password typed twice, for reset, invitation and change. */
@Component({
  selector: 'lw-new-password-fields',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <ng-container [formGroup]="group()">
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="first">
        <mat-label>New password</mat-label>
        <input matInput type="password" formControlName="password" autocomplete="new-password" required />
        <mat-hint>At least 10 characters; a few words make a good one.</mat-hint>
        <mat-error>{{ errorText(control('password')) }}</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>New password again</mat-label>
        <input matInput type="password" formControlName="repeat" autocomplete="new-password" required />
        <mat-error>{{ errorText(control('repeat')) }}</mat-error>
      </mat-form-field>
    </ng-container>
  `,
  styles: `:host { display: contents; } mat-form-field { width: 100%; } .first { margin-bottom: 20px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewPasswordFields {
  /** Any form with `password` and `repeat` controls (and maybe more). */
  readonly group = input.required<FormGroup>();
  protected readonly errorText = errorText;

  protected control(name: 'password' | 'repeat'): FormControl<string> {
    return this.group().get(name) as FormControl<string>;
  }
}
