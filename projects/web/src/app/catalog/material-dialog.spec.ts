import { TestBed } from '@angular/core/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { apiInterceptor } from '../core/api-interceptor';
import { Session } from '../core/session';
import type { Material } from './catalog-types';
import { MaterialDialog } from './material-dialog';

const draft: Material = {
  id: 7, name: 'Core A', state: 'draft', version: 3, createdBy: 2, updatedBy: 2, createdAt: '2026-12-01T09:00:00.000Z', updatedAt: '2026-12-01T09:00:00.000Z',
  description: null, dk: 4.1, df: 0.015, referenceFrequency: 1e9, dkDfTable: null, dielectricStrength: null, notes: null,
};

async function open(entry?: Material) {
  const close = vi.fn();
  TestBed.configureTestingModule({
    imports: [MaterialDialog],
    providers: [
      provideZonelessChangeDetection(),
      provideHttpClient(withInterceptors([apiInterceptor])),
      provideHttpClientTesting(),
      { provide: MAT_DIALOG_DATA, useValue: { entry } },
      { provide: MatDialogRef, useValue: { close } },
    ],
  });
  TestBed.inject(Session).adopt({ id: 2, email: 'engineer@halden.test', name: 'Engineer', role: 'engineer', preferences: {}, isActive: true });
  const fixture = TestBed.createComponent(MaterialDialog);
  const harnesses = TestbedHarnessEnvironment.loader(fixture);
  await fixture.whenStable();
  return { fixture, harnesses, close, backend: TestBed.inject(HttpTestingController) };
}

describe('MaterialDialog', () => {
  it('posts a new material in SI units (GHz and kV/mm converted) and closes with it', async () => {
    const { harnesses, close, backend } = await open();
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="name"]' }))).setValue('Halden core B');
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="dk"]' }))).setValue('3.7');
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="referenceFrequencyGhz"]' }))).setValue('10');
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="strengthKvPerMm"]' }))).setValue('30');
    await (await harnesses.getHarness(MatButtonHarness.with({ text: 'Save as draft' }))).click();

    const request = backend.expectOne('/api/v1/materials');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toMatchObject({ name: 'Halden core B', dk: 3.7, referenceFrequency: 1e10, dielectricStrength: 3e7, dkDfTable: null });
    request.flush({ ...draft, id: 8, name: 'Halden core B' }, { headers: { ETag: '"1"' } });
    await new Promise((resolve) => setTimeout(resolve));
    expect(close).toHaveBeenCalledWith(expect.objectContaining({ name: 'Halden core B' }));
  });

  it('shows the server\'s field problem under the field it names', async () => {
    const { harnesses, backend, fixture } = await open();
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="name"]' }))).setValue('Glass-epoxy');
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="dk"]' }))).setValue('4.3');
    await (await harnesses.getHarness(MatButtonHarness.with({ text: 'Save as draft' }))).click();
    backend.expectOne('/api/v1/materials').flush(
      { title: 'Conflict', status: 409, detail: 'Another entry already has this name.', errors: [{ field: 'name', detail: 'is already used' }] },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    const nameField = await harnesses.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Name' }));
    expect(await nameField.getTextErrors()).toEqual(['Is already used']);
  });

  it('explains a stale version (409) and reloads the stored entry on request', async () => {
    const { harnesses, backend, fixture } = await open(draft);
    await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="df"]' }))).setValue('0.02');
    await (await harnesses.getHarness(MatButtonHarness.with({ text: 'Save' }))).click();
    const update = backend.expectOne('/api/v1/materials/7');
    expect(update.request.headers.get('If-Match')).toBe('"3"');
    update.flush(
      { title: 'Conflict', status: 409, detail: 'This entry was changed by someone else since you read it (it is now version 4); reload it and apply your change again.' },
      { status: 409, statusText: 'Conflict', headers: { ETag: '"4"' } },
    );
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
    expect(fixture.nativeElement.textContent).toContain('it is now version 4');

    await (await harnesses.getHarness(MatButtonHarness.with({ text: 'Reload the entry' }))).click();
    backend.expectOne('/api/v1/materials/7').flush({ ...draft, version: 4, df: 0.017 }, { headers: { ETag: '"4"' } });
    await fixture.whenStable();
    await new Promise((resolve) => setTimeout(resolve));
    expect(await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="df"]' }))).getValue()).toBe('0.017');
    expect(fixture.nativeElement.textContent).not.toContain('Not saved');
  });

  it('shows an approved entry read-only, with no save button', async () => {
    const { harnesses } = await open({ ...draft, state: 'approved' });
    expect(await harnesses.getAllHarnesses(MatButtonHarness.with({ text: /^Save/ }))).toHaveLength(0);
    expect(await (await harnesses.getHarness(MatInputHarness.with({ selector: '[formControlName="dk"]' }))).isDisabled()).toBe(true);
  });
});
