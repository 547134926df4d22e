/**
 * The one sentence a `<mat-error>` shows for a control: the server's word
 * when it named the field (set by ProblemDisplay), else the validator's.
 */
import type { AbstractControl } from '@angular/forms';

export const SERVER_ERROR = 'server';

export function errorText(control: AbstractControl): string {
  const errors = control.errors;
  if (!errors) return '';
  if (errors[SERVER_ERROR]) return String(errors[SERVER_ERROR]);
  if (errors['required']) return 'Required.';
  if (errors['email']) return 'Enter an e-mail address such as name@example.com.';
  if (errors['minlength']) return `At least ${errors['minlength'].requiredLength} characters.`;
  if (errors['maxlength']) return `At most ${errors['maxlength'].requiredLength} characters.`;
  if (errors['min']) return `At least ${errors['min'].min}.`;
  if (errors['max']) return `At most ${errors['max'].max}.`;
  if (errors['pattern']) return 'Not in the expected form.';
  const custom = Object.values(errors).find((value) => typeof value === 'string');
  return typeof custom === 'string' ? custom : 'Not valid.';
}
