import { useTranslation } from 'react-i18next';
import { ROLES, type Role } from '@yardcall/shared';
import { Panel } from '@/components/ui/layout';

export const DEMO_PASSWORD = 'yardcall-demo';

export function demoEmail(role: Role): string {
  return `${role}@yardcall.test`;
}

// The demo build lists its invented accounts; a production build sets VITE_DEMO=false.
export function isDemoBuild(): boolean {
  return import.meta.env.VITE_DEMO !== 'false';
}

export function DemoSignIns({ onPick }: { onPick: (email: string, password: string) => void }) {
  const { t } = useTranslation();
  return (
    <Panel title={t('signIn.demo.title')} aside data-testid="demo-sign-ins">
      <p className="mt-1 text-muted">{t('signIn.demo.body', { password: DEMO_PASSWORD })}</p>
      <ul className="mt-3 flex flex-col gap-tap-gap">
        {ROLES.map((role) => (
          <li key={role} className="flex flex-wrap items-center justify-between gap-2">
            <span>
              <span className="font-bold">{t(`roles.${role}`)}</span>: <code>{demoEmail(role)}</code>
            </span>
            <button
              type="button"
              className="min-h-tap rounded-lg border-2 border-line px-3 font-bold"
              onClick={() => onPick(demoEmail(role), DEMO_PASSWORD)}
            >
              {t('signIn.demo.use', { role: t(`roles.${role}`) })}
            </button>
          </li>
        ))}
      </ul>
    </Panel>
  );
}
