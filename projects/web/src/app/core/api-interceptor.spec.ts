import { TestBed } from '@angular/core/testing';
import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { apiInterceptor, CSRF_HEADER } from './api-interceptor';
import { ApiProblem } from './api-problem';
import { Session } from './session';

describe('apiInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let session: Session;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(withInterceptors([apiInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    session = TestBed.inject(Session);
  });

  afterEach(() => backend.verify());

  it('sends the CSRF header and credentials on unsafe API requests', () => {
    http.post('/api/v1/materials', { name: 'A', dk: 4 }).subscribe();
    const request = backend.expectOne('/api/v1/materials').request;
    expect(request.headers.get(CSRF_HEADER)).toBe('XMLHttpRequest');
    expect(request.withCredentials).toBe(true);
  });

  it('leaves safe requests without the CSRF header', () => {
    http.get('/api/v1/materials').subscribe();
    expect(backend.expectOne('/api/v1/materials').request.headers.has(CSRF_HEADER)).toBe(false);
  });

  it('never adds our header to requests for other hosts', () => {
    http.post('https://elsewhere.test/api/v1/x', {}).subscribe();
    const request = backend.expectOne('https://elsewhere.test/api/v1/x').request;
    expect(request.headers.has(CSRF_HEADER)).toBe(false);
    expect(request.withCredentials).toBe(false);
  });

  it('turns a problem+json answer into an ApiProblem with its field errors and ETag', async () => {
    const answer = firstValueFrom(http.patch('/api/v1/materials/7', { dk: 0 }));
    backend.expectOne('/api/v1/materials/7').flush(
      { type: '/api/docs#problem-409', title: 'Conflict', status: 409, detail: 'It is now version 4.', errors: [{ field: 'dk', detail: 'must be >= 1' }] },
      { status: 409, statusText: 'Conflict', headers: { ETag: '"4"', 'Content-Type': 'application/problem+json' } },
    );
    const problem = await answer.then(() => undefined, (error: unknown) => error);
    expect(problem).toBeInstanceOf(ApiProblem);
    const apiProblem = problem as ApiProblem;
    expect(apiProblem.status).toBe(409);
    expect(apiProblem.message).toBe('It is now version 4.');
    expect(apiProblem.errorsFor('dk')).toEqual([{ field: 'dk', detail: 'must be >= 1' }]);
    expect(apiProblem.etag).toBe('"4"');
  });

  it('forgets the session when a later call answers 401', async () => {
    session.adopt({ id: 1, email: 'a@halden.test', name: 'A', role: 'engineer', preferences: {}, isActive: true });
    const answer = firstValueFrom(http.get('/api/v1/tokens')).catch(() => undefined);
    backend.expectOne('/api/v1/tokens').flush({ title: 'Not signed in', status: 401 }, { status: 401, statusText: 'Unauthorized' });
    await answer;
    expect(session.isSignedIn()).toBe(false);
  });
});
