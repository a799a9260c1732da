import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { CaughtMail } from '@yardcall/shared';
import { EmptyState } from '@/components/ui/layout';

const LINK_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

// An invitation link in the demo's mail goes to this same app: open it in place.
function linkTarget(url: string): string {
  try {
    const parsed = new URL(url);
    return parsed.origin === window.location.origin ? `${parsed.pathname}${parsed.search}` : url;
  } catch {
    return url;
  }
}

function MailText({ text }: { text: string }) {
  const parts = text.split(LINK_PATTERN);
  return (
    <p className="whitespace-pre-wrap">
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a key={index} href={linkTarget(part)} className="font-bold text-primary underline">
            {part}
          </a>
        ) : (
          <span key={index}>{part}</span>
        ),
      )}
    </p>
  );
}

export function OutboxList({ mails }: { mails: CaughtMail[] }) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  if (mails.length === 0) return <EmptyState title={t('outbox.empty')} />;
  const sorted = [...mails].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return (
    <ul className="flex flex-col gap-tap-gap" aria-label={t('outbox.label')}>
      {sorted.map((mail) => (
        <li key={mail.id} className="min-w-0 rounded-xl border-2 border-line bg-surface p-4" data-testid="caught-mail">
          <h2 className="text-xl font-bold">{mail.subject}</h2>
          <p className="text-muted">
            {t('outbox.to', { to: mail.to.join(', ') })} · {dates.dateTime(mail.receivedAt)}
          </p>
          <div className="mt-2">
            <MailText text={mail.text} />
          </div>
        </li>
      ))}
    </ul>
  );
}
