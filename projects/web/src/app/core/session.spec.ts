import { TestBed } from '@angular/core/testing';
import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { apiInterceptor } from './api-interceptor';
import type { User } from './auth-api';
import { Session } from './session';

const engineer: User = { id: 2, email: 'engineer@halden.test', name: 'Demo engineer', role: 'engineer', preferences: { lengthUnit: 'mil' }, isActive: true };

describe('Session', () => {
  let session: Session;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(withInterceptors([apiInterceptor])), provideHttpClientTesting()],
    });
    session = TestBed.inject(Session);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('is signed out when /auth/me answers 401, and asks only once', async () => {
    const first = session.ready();
    const second = session.ready();
    backend.expectOne('/api/v1/auth/me').flush({ title: 'Not signed in', status: 401 }, { status: 401, statusText: 'Unauthorized' });
    expect(await first).toBeNull();
    expect(await second).toBeNull();
    expect(session.isKnown()).toBe(true);
    expect(session.canEdit()).toBe(false);
    expect(session.preferredLengthUnit()).toBe('mm');
  });

  it('reads the role checks and the preferred length unit from the signed-in user', async () => {
    const ready = session.ready();
    backend.expectOne('/api/v1/auth/me').flush(engineer);
    await ready;
    expect(session.canEdit()).toBe(true);
    expect(session.isAdmin()).toBe(false);
    expect(session.preferredLengthUnit()).toBe('mil');
  });

  it('signs in with a POST to /auth/login and keeps the user it answers', async () => {
    const signIn = session.signIn('engineer@halden.test', 'halden-engineer-1');
    const request = backend.expectOne('/api/v1/auth/login');
    expect(request.request.body).toEqual({ email: 'engineer@halden.test', password: 'halden-engineer-1' });
    request.flush({ user: engineer });
    await signIn;
    expect(session.user()?.email).toBe('engineer@halden.test');
  });

  it('saves a new preferred length unit with a PATCH and shows it at once', async () => {
    session.adopt(engineer);
    const saving = session.setPreferredLengthUnit('um');
    const request = backend.expectOne('/api/v1/auth/me/preferences');
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ lengthUnit: 'um' });
    request.flush({ ...engineer, preferences: { lengthUnit: 'um' } });
    await saving;
    expect(session.preferredLengthUnit()).toBe('um');
  });

  it('forgets the user on sign-out', async () => {
    session.adopt(engineer);
    const signOut = session.signOut();
    backend.expectOne('/api/v1/auth/logout').flush(null, { status: 204, statusText: 'No Content' });
    await signOut;
    expect(session.isSignedIn()).toBe(false);
  });
});
