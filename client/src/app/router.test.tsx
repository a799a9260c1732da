import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { createMemoryRouter } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { ROLES, type Role } from '@yardcall/shared';
import { setUnauthorizedHandler, tokenStore } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { makeUser, makeVehicle } from '@/testing/fixtures';
import { errorBody, mockApi } from '@/testing/mock-api';
import { AppProvider } from './provider';
import { HOME_PATHS } from './role-homes';
import { createAppRoutes } from './router';
import { handleSessionExpiry } from './session-expiry';

function renderApp(path: string) {
  const queryClient = createQueryClient();
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [path] });
  handleSessionExpiry(router, queryClient);
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { router, queryClient };
}

const HOME_HEADINGS: Record<Role, string> = {
  driver: 'Driver home',
  mechanic: 'Shop',
  supervisor: 'Fleet board',
  trainer: 'Training',
  admin: 'Administration',
};

afterEach(() => setUnauthorizedHandler(null));

describe('app routes', () => {
  it.each(ROLES)('sends a signed-in %s from / to their own home', async (role) => {
    tokenStore.set('token');
    mockApi({
      'GET /auth/me': { body: makeUser(role) },
      'GET /vehicles': {
        body: [makeVehicle(), makeVehicle({ id: 'veh-2', unitNumber: 'T-415', status: 'out_of_service' })],
      },
      'GET /users': { body: [makeUser('driver', { id: 'student-1', name: 'Ren Adeyemi', isStudent: true })] },
      'GET /defects': { body: [] },
    });
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: HOME_HEADINGS[role] })).toBeInTheDocument();
    expect(screen.getByTestId(`home-${role}`)).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(HOME_PATHS[role]);
  });

  it("sends a driver who opens the admin screens back to the driver's home", async () => {
    tokenStore.set('token');
    mockApi({ 'GET /auth/me': { body: makeUser('driver') } });
    const { router } = renderApp('/admin/users');
    expect(await screen.findByRole('heading', { level: 1, name: 'Driver home' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/driver');
  });

  it('sends a signed-out visitor to sign-in, remembering where they were going', async () => {
    const { calls } = mockApi({});
    const { router } = renderApp('/vehicles?q=T-4');
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe('/vehicles?q=T-4');
    expect(calls).toHaveLength(0);
  });

  it('on a 401 from a data call goes to sign-in with next, and back there after signing in', async () => {
    tokenStore.set('expired-token');
    let expired = true;
    const { calls } = mockApi({
      'GET /auth/me': { body: makeUser('supervisor') },
      'GET /vehicles': () =>
        expired
          ? { status: 401, body: errorBody(401, 'Your session has expired. Sign in again.') }
          : { body: [makeVehicle()] },
      'POST /auth/login': () => {
        expired = false;
        return { body: { accessToken: 'fresh-token', user: makeUser('supervisor') } };
      },
    });
    const { router } = renderApp('/vehicles');

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/vehicles')}`);
    expect(tokenStore.get()).toBeNull();

    await userEvent.type(screen.getByLabelText('E-mail address'), 'supervisor@yardcall.test');
    await userEvent.type(screen.getByLabelText('Password'), 'yardcall-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Vehicles' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/vehicles');
    expect(tokenStore.get()).toBe('fresh-token');
    expect(calls.at(-1)?.headers.Authorization).toBe('Bearer fresh-token');
  });

  it('keeps the settings screen in reach from the header of every screen', async () => {
    tokenStore.set('token');
    mockApi({
      'GET /auth/me': { body: makeUser('mechanic') },
      'GET /defects': { body: [] },
      'GET /vehicles': { body: [] },
    });
    renderApp('/mechanic');
    await screen.findByRole('heading', { level: 1, name: 'Shop' });
    const header = screen.getByRole('banner');
    expect(header).toContainElement(screen.getByRole('link', { name: 'Settings' }));
    await userEvent.click(screen.getByRole('link', { name: 'Settings' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Display settings' })).toBeInTheDocument();
  });
});
