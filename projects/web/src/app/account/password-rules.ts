import { Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';

/** The server's NewPassword schema: 10 to 72 characters (bcrypt reads at most 72 bytes). */
export const NEW_PASSWORD_VALIDATORS = [Validators.required, Validators.minLength(10), Validators.maxLength(72)];

/** On a group with `password` and `repeat`: both the same. */
export function samePasswords(group: AbstractControl): ValidationErrors | null {
  const password = group.get('password')?.value;
  const repeat = group.get('repeat');
  if (!repeat) return null;
  const isSame = password === repeat.value;
  const { mismatch: _old, ...others } = repeat.errors ?? {};
  repeat.setErrors(isSame ? (Object.keys(others).length ? others : null) : { ...others, mismatch: 'The two passwords differ.' });
  return null;
}
