import { useEffect, useRef, useState } from 'react';
import { useTranslation } from 'react-i18next';
import {
  LOCALES,
  TEXT_SCALE_MAX,
  TEXT_SCALE_MIN,
  THEMES,
  type DisplaySettings,
  type Locale,
  type Theme,
} from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { CheckboxField } from '@/components/ui/field';
import { Card, Section, Stack } from '@/components/ui/layout';
import { clampTextScale, NIGHT_RED_MIN_TEXT_SCALE, showDisplaySettings } from '@/lib/display-settings';
import { describeError } from '@/lib/errors';
import { useUpdateSettings } from '@/lib/api/auth';

export const TEXT_SCALE_STEPS = [100, 125, 150, 175, 200] as const;
const SLIDER_STEP = 5;
// Long enough that dragging the slider sends one save, short enough to feel saved at once.
const SAVE_DELAY_MS = 400;

const LANGUAGE_NAMES: Record<Locale, string> = { en: 'English', es: 'Español' };

interface SettingsFormProps {
  initial: DisplaySettings;
  // Signed out (on the sign-in screen) the settings stay on this device only.
  saveToAccount: boolean;
}

export function SettingsForm({ initial, saveToAccount }: SettingsFormProps) {
  const { t } = useTranslation();
  const save = useUpdateSettings();
  const [settings, setSettings] = useState<DisplaySettings>(initial);
  const pending = useRef<DisplaySettings | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const { mutate } = save;

  // Leaving the screen before the delay is over still saves the last choice.
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      if (pending.current) mutate(pending.current);
    },
    [mutate],
  );

  function change(patch: Partial<DisplaySettings>) {
    const next = { ...settings, ...patch, textScale: clampTextScale(patch.textScale ?? settings.textScale) };
    setSettings(next);
    showDisplaySettings(next);
    if (!saveToAccount) return;
    pending.current = next;
    clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      pending.current = null;
      mutate(next);
    }, SAVE_DELAY_MS);
  }

  return (
    <Stack>
      {save.isError ? <ErrorAlert>{t('settings.saveFailed', { reason: describeError(save.error) })}</ErrorAlert> : null}
      {saveToAccount ? null : <Notice>{t('settings.deviceOnly')}</Notice>}

      <Section title={t('settings.textSize.title')} id="settings-text-size">
        <Card>
          <Stack>
            <p className="flex flex-wrap items-baseline justify-between gap-2">
              <label htmlFor="text-scale" className="font-bold">
                {t('settings.textSize.label')}
              </label>
              <output htmlFor="text-scale" className="text-xl font-bold">
                {settings.textScale} %
              </output>
            </p>
            <input
              id="text-scale"
              type="range"
              min={TEXT_SCALE_MIN}
              max={TEXT_SCALE_MAX}
              step={SLIDER_STEP}
              value={settings.textScale}
              aria-valuetext={`${settings.textScale} %`}
              className="h-tap w-full accent-primary"
              onChange={(event) => change({ textScale: Number(event.target.value) })}
            />
            <div className="flex flex-wrap gap-tap-gap" role="group" aria-label={t('settings.textSize.steps')}>
              <Button
                variant="secondary"
                onClick={() => change({ textScale: settings.textScale - 25 })}
                disabled={settings.textScale <= TEXT_SCALE_MIN}
              >
                {t('settings.textSize.smaller')}
              </Button>
              {TEXT_SCALE_STEPS.map((step) => (
                <Button
                  key={step}
                  variant={settings.textScale === step ? 'primary' : 'secondary'}
                  aria-pressed={settings.textScale === step}
                  onClick={() => change({ textScale: step })}
                >
                  {step} %
                </Button>
              ))}
              <Button
                variant="secondary"
                onClick={() => change({ textScale: settings.textScale + 25 })}
                disabled={settings.textScale >= TEXT_SCALE_MAX}
              >
                {t('settings.textSize.larger')}
              </Button>
            </div>
            {settings.theme === 'night_red' && settings.textScale < NIGHT_RED_MIN_TEXT_SCALE ? (
              <p className="text-muted">
                {t('settings.textSize.nightRedMinimum', { percent: NIGHT_RED_MIN_TEXT_SCALE })}
              </p>
            ) : null}
          </Stack>
        </Card>
      </Section>

      <Section title={t('settings.theme.title')} id="settings-theme">
        <fieldset className="flex flex-col gap-tap-gap">
          <legend className="sr-only">{t('settings.theme.title')}</legend>
          {THEMES.map((theme: Theme) => (
            <label
              key={theme}
              className="grid min-h-tap cursor-pointer grid-cols-[auto_1fr] items-start gap-x-3 rounded-xl border-2 border-line bg-surface p-3 has-[:checked]:border-4 has-[:checked]:border-primary"
            >
              <input
                type="radio"
                name="theme"
                value={theme}
                checked={settings.theme === theme}
                onChange={() => change({ theme })}
                className="row-span-2 mt-1 size-7 shrink-0 accent-primary"
              />
              <span className="font-bold">{t(`settings.theme.${theme}.name`)}</span>
              <span className="text-muted">{t(`settings.theme.${theme}.description`)}</span>
            </label>
          ))}
        </fieldset>
      </Section>

      <Section title={t('settings.glove.title')} id="settings-glove">
        <Card>
          <CheckboxField
            label={t('settings.glove.label')}
            role="switch"
            checked={settings.gloveMode}
            onChange={(event) => change({ gloveMode: event.target.checked })}
          />
          <p className="mt-2 text-muted">{t('settings.glove.description')}</p>
        </Card>
      </Section>

      <Section title={t('settings.language.title')} id="settings-language">
        <fieldset className="flex flex-wrap gap-tap-gap">
          <legend className="sr-only">{t('settings.language.title')}</legend>
          {LOCALES.map((locale) => (
            <label
              key={locale}
              lang={locale}
              className="flex min-h-tap cursor-pointer items-center gap-3 rounded-xl border-2 border-line bg-surface px-4 has-[:checked]:border-4 has-[:checked]:border-primary"
            >
              <input
                type="radio"
                name="locale"
                value={locale}
                checked={settings.locale === locale}
                onChange={() => change({ locale })}
                className="size-7 accent-primary"
              />
              <span className="font-bold">{LANGUAGE_NAMES[locale]}</span>
            </label>
          ))}
        </fieldset>
      </Section>

      <p role="status" className="min-h-tap text-muted" data-testid="settings-save-status">
        {save.isPending ? t('settings.saving') : save.isSuccess ? t('settings.saved') : ''}
      </p>
    </Stack>
  );
}
