import type { AbstractControl, ValidationErrors } from '@angular/forms';

/** Empty passes (use Validators.required for that); zero and below do not. */
export function greaterThanZero(control: AbstractControl): ValidationErrors | null {
  const value = control.value;
  return value === null || value === '' || Number(value) > 0 ? null : { positive: 'Must be more than 0.' };
}
