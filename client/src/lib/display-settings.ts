import {
  DEFAULT_DISPLAY_SETTINGS,
  TEXT_SCALE_MAX,
  TEXT_SCALE_MIN,
  THEMES,
  type DisplaySettings,
  type Theme,
} from '@yardcall/shared';
import { i18n, isLocale } from './i18n';

const STORAGE_KEY = 'yardcall.display-settings';

export function clampTextScale(value: number): number {
  if (!Number.isFinite(value)) return DEFAULT_DISPLAY_SETTINGS.textScale;
  return Math.min(TEXT_SCALE_MAX, Math.max(TEXT_SCALE_MIN, Math.round(value)));
}

function isTheme(value: unknown): value is Theme {
  return (THEMES as readonly unknown[]).includes(value);
}

export function themeClassName(theme: Theme): string {
  return `theme-${theme}`;
}

// Whatever is stored may be old or hand-edited: keep only what is valid.
export function normalizeDisplaySettings(value: unknown): DisplaySettings {
  const raw =
    typeof value === 'object' && value !== null ? (value as Partial<Record<keyof DisplaySettings, unknown>>) : {};
  return {
    textScale: typeof raw.textScale === 'number' ? clampTextScale(raw.textScale) : DEFAULT_DISPLAY_SETTINGS.textScale,
    theme: isTheme(raw.theme) ? raw.theme : DEFAULT_DISPLAY_SETTINGS.theme,
    gloveMode: typeof raw.gloveMode === 'boolean' ? raw.gloveMode : DEFAULT_DISPLAY_SETTINGS.gloveMode,
    locale: isLocale(raw.locale) ? raw.locale : DEFAULT_DISPLAY_SETTINGS.locale,
  };
}

// The last settings used on this device, so the sign-in screen already looks the way the driver left it.
export function readCachedDisplaySettings(): DisplaySettings {
  try {
    const stored = localStorage.getItem(STORAGE_KEY);
    return normalizeDisplaySettings(stored ? JSON.parse(stored) : null);
  } catch {
    return { ...DEFAULT_DISPLAY_SETTINGS };
  }
}

export function cacheDisplaySettings(settings: DisplaySettings): void {
  localStorage.setItem(STORAGE_KEY, JSON.stringify(settings));
}

// Night red is pure red on black (5.25:1), so its text must be large-scale: bold and at least 117 %
// (1rem = 18.7 px, WCAG 2.2 "large scale" 14 pt bold, where 1.4.6 asks 4.5:1).
export const NIGHT_RED_MIN_TEXT_SCALE = 117;

export function effectiveTextScale(settings: DisplaySettings): number {
  const scale = clampTextScale(settings.textScale);
  return settings.theme === 'night_red' ? Math.max(scale, NIGHT_RED_MIN_TEXT_SCALE) : scale;
}

export function applyDisplaySettings(settings: DisplaySettings, root: HTMLElement = document.documentElement): void {
  // Root font size in percent: everything sized in rem follows it.
  root.style.fontSize = `${effectiveTextScale(settings)}%`;
  for (const theme of THEMES) root.classList.toggle(themeClassName(theme), theme === settings.theme);
  root.classList.toggle('glove', settings.gloveMode);
  root.lang = settings.locale;
  if (i18n.language !== settings.locale) void i18n.changeLanguage(settings.locale);
}

// Apply at once and remember on this device; saving to the account is the caller's job.
export function showDisplaySettings(settings: DisplaySettings): void {
  applyDisplaySettings(settings);
  cacheDisplaySettings(settings);
}
