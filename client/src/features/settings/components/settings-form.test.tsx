import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { DEFAULT_DISPLAY_SETTINGS, type DisplaySettings } from '@yardcall/shared';
import { readCachedDisplaySettings } from '@/lib/display-settings';
import { i18n } from '@/lib/i18n';
import { makeUser } from '@/testing/fixtures';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SettingsForm } from './settings-form';

function mockSettingsSave() {
  return mockApi({
    'PATCH /auth/me/settings': (call: RecordedCall) => ({
      body: makeUser('driver', { settings: call.body as DisplaySettings }),
    }),
  });
}

describe('SettingsForm', () => {
  it('applies the text size as the root font size at once and saves it to the account', async () => {
    const { calls } = mockSettingsSave();
    renderWithProviders(<SettingsForm initial={DEFAULT_DISPLAY_SETTINGS} saveToAccount />);

    fireEvent.change(screen.getByRole('slider', { name: 'Text size' }), { target: { value: '150' } });

    expect(document.documentElement.style.fontSize).toBe('150%');
    await vi.waitFor(() => expect(calls.filter((call) => call.method === 'PATCH')).toHaveLength(1));
    expect(calls[0]?.body).toEqual({ ...DEFAULT_DISPLAY_SETTINGS, textScale: 150 });
    expect(await screen.findByText('Saved to your account.')).toBeInTheDocument();
  });

  it('switches the theme class on <html>, turns on glove mode and remembers both on this device', async () => {
    const { calls } = mockSettingsSave();
    renderWithProviders(<SettingsForm initial={DEFAULT_DISPLAY_SETTINGS} saveToAccount />);

    await userEvent.click(screen.getByRole('radio', { name: /Night red/ }));
    await userEvent.click(screen.getByRole('switch', { name: 'Glove mode' }));

    const root = document.documentElement;
    expect(root).toHaveClass('theme-night_red', 'glove');
    expect(root).not.toHaveClass('theme-day');
    // Pure red on black is only 5.25:1, so night red keeps text large-scale.
    expect(root.style.fontSize).toBe('117%');
    expect(readCachedDisplaySettings()).toMatchObject({ theme: 'night_red', gloveMode: true });
    await vi.waitFor(() => expect(calls.at(-1)?.body).toMatchObject({ theme: 'night_red', gloveMode: true }));
  });

  it('changes the language of the page and its strings', async () => {
    mockSettingsSave();
    renderWithProviders(<SettingsForm initial={DEFAULT_DISPLAY_SETTINGS} saveToAccount />);
    await userEvent.click(screen.getByRole('radio', { name: 'Español' }));
    expect(document.documentElement.lang).toBe('es');
    expect(i18n.language).toBe('es');
    expect(await screen.findByRole('heading', { name: 'Tamaño del texto' })).toBeInTheDocument();
  });

  it('steps the text size and stops at 200 %', async () => {
    mockSettingsSave();
    renderWithProviders(<SettingsForm initial={{ ...DEFAULT_DISPLAY_SETTINGS, textScale: 175 }} saveToAccount />);
    await userEvent.click(screen.getByRole('button', { name: 'Larger' }));
    expect(document.documentElement.style.fontSize).toBe('200%');
    expect(screen.getByRole('button', { name: 'Larger' })).toBeDisabled();
    expect(screen.getByRole('button', { name: '200 %' })).toHaveAttribute('aria-pressed', 'true');
  });

  it('signed out, keeps the settings on this device without calling the API', async () => {
    const { calls } = mockSettingsSave();
    renderWithProviders(<SettingsForm initial={DEFAULT_DISPLAY_SETTINGS} saveToAccount={false} />);
    await userEvent.click(screen.getByRole('radio', { name: /Night \(dim\)/ }));
    expect(document.documentElement).toHaveClass('theme-night');
    expect(readCachedDisplaySettings().theme).toBe('night');
    await new Promise((resolve) => setTimeout(resolve, 500));
    expect(calls).toHaveLength(0);
  });
});
