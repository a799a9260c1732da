import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { tokenStore } from '@/lib/api-client';
import { authKeys } from '@/lib/api/auth';
import { makeUser } from '@/testing/fixtures';
import { errorBody, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

describe('SignInForm', () => {
  it("shows the server's error message when the sign-in is refused", async () => {
    const { calls } = mockApi({
      'POST /auth/login': { status: 401, body: errorBody(401, 'That e-mail and password do not match an account.') },
    });
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    await userEvent.type(screen.getByLabelText('E-mail address'), 'driver@yardcall.test');
    await userEvent.type(screen.getByLabelText('Password'), 'wrong-password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('That e-mail and password do not match an account.');
    expect(calls[0]?.body).toEqual({ email: 'driver@yardcall.test', password: 'wrong-password' });
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('says plainly when the server throttles sign-in attempts', async () => {
    mockApi({ 'POST /auth/login': { status: 429, body: errorBody(429, 'ThrottlerException: Too Many Requests') } });
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.type(screen.getByLabelText('E-mail address'), 'driver@yardcall.test');
    await userEvent.type(screen.getByLabelText('Password'), 'x');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Too many attempts. Wait a minute, then try again.');
  });

  it('keeps the token and the user after a successful sign-in', async () => {
    const user = makeUser('driver', { settings: { textScale: 150, theme: 'night', gloveMode: true, locale: 'en' } });
    mockApi({ 'POST /auth/login': { body: { accessToken: 'token-abc', user } } });
    const onSignedIn = vi.fn();
    const { queryClient } = renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    await userEvent.click(screen.getByRole('button', { name: 'Fill in the Driver account' }));
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(tokenStore.get()).toBe('token-abc');
    expect(queryClient.getQueryData(authKeys.me())).toEqual(user);
    // The account's display settings apply at once.
    expect(document.documentElement).toHaveClass('theme-night', 'glove');
    expect(document.documentElement.style.fontSize).toBe('150%');
  });

  it('lists the demo sign-ins in the demo build', () => {
    mockApi({});
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    const demo = screen.getByTestId('demo-sign-ins');
    expect(demo).toHaveTextContent('admin@yardcall.test');
    expect(demo).toHaveTextContent('yardcall-demo');
  });
});
