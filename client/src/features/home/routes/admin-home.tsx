import { useTranslation } from 'react-i18next';
import { LinkButton } from '@/components/ui/link-button';
import { HomePage } from '../components/home-page';

export function AdminHome() {
  const { t } = useTranslation();
  const links = [
    { to: '/admin/users', label: t('admin.users'), hint: t('admin.usersHint') },
    { to: '/vehicles', label: t('admin.vehicles'), hint: t('admin.vehiclesHint') },
    { to: '/admin/outbox', label: t('admin.outbox'), hint: t('admin.outboxHint') },
    { to: '/admin/retention', label: t('retention.homeLink'), hint: t('retention.homeHint') },
    { to: '/admin/time-zone', label: t('timeZone.homeLink'), hint: t('timeZone.homeHint') },
    { to: '/admin/readings', label: t('readings.homeLink'), hint: t('readings.homeHint') },
  ];
  return (
    <HomePage forRole="admin" title={t('admin.title')} lead={t('admin.lead')}>
      <nav aria-label={t('admin.title')}>
        <ul className="grid grid-cols-1 gap-tap-gap md:grid-cols-2 lg:grid-cols-4">
          {links.map((link) => (
            <li key={link.to} className="flex flex-col gap-2 rounded-xl border-2 border-line bg-surface p-4">
              <LinkButton to={link.to}>{link.label}</LinkButton>
              <p className="text-muted">{link.hint}</p>
            </li>
          ))}
        </ul>
      </nav>
    </HomePage>
  );
}
