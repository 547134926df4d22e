import { FormControl, FormGroup } from '@angular/forms';
import { applyFieldProblems } from './problem-display';
import { errorText } from './form-errors';

describe('applyFieldProblems', () => {
  const form = () =>
    new FormGroup({
      name: new FormControl(''),
      target: new FormGroup({ value: new FormControl(50) }),
      geometry: new FormGroup({ w: new FormControl(0.3) }),
      referenceFrequencyGhz: new FormControl(1),
    });

  it('puts a named problem on its control, where mat-error shows it', () => {
    const group = form();
    const rest = applyFieldProblems(group, [{ field: 'name', detail: 'is already used' }]);
    expect(rest).toEqual([]);
    expect(errorText(group.controls.name)).toBe('Is already used');
    expect(group.controls.name.touched).toBe(true);
  });

  it('follows dotted paths into nested groups', () => {
    const group = form();
    applyFieldProblems(group, [{ field: 'target.value', detail: 'must be > 0' }, { field: 'geometry.w', detail: 'must be greater than 0' }]);
    expect(errorText(group.controls.target.controls.value)).toBe('Must be > 0');
    expect(errorText(group.controls.geometry.controls.w)).toBe('Must be greater than 0');
  });

  it('maps request field names the form spells differently', () => {
    const group = form();
    applyFieldProblems(group, [{ field: 'referenceFrequency', detail: 'must be a frequency' }], { referenceFrequency: 'referenceFrequencyGhz' });
    expect(errorText(group.controls.referenceFrequencyGhz)).toBe('Must be a frequency');
  });

  it('hands back the problems no control takes, for the snackbar', () => {
    const rest = applyFieldProblems(form(), [{ field: 'If-Match', detail: 'must look like "3"' }]);
    expect(rest).toEqual([{ field: 'If-Match', detail: 'must look like "3"' }]);
  });
});
