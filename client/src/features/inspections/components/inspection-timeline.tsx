import { useTranslation } from 'react-i18next';
import type { ZoneVisit } from '@yardcall/shared';
import { formatSeconds } from '../utils/format';

// The route as walked: each zone visit with its share of the time (bar plus the figure in words).
export function InspectionTimeline({ visits }: { visits: ZoneVisit[] }) {
  const { t } = useTranslation();
  if (visits.length === 0) return <p>{t('inspections.detail.noTimeline')}</p>;
  const longest = Math.max(...visits.map((visit) => visit.seconds), 1);
  return (
    <ol className="flex flex-col gap-2" data-testid="inspection-timeline">
      {visits.map((visit, index) => (
        <li
          key={`${visit.zone}-${visit.firstAnsweredAt}`}
          className="grid gap-x-3 sm:grid-cols-[minmax(0,16rem)_1fr]"
          data-testid="timeline-zone"
        >
          <p>
            <span className="font-bold">
              {index + 1}. {visit.title}
            </span>{' '}
            <span className="text-muted">
              {t('inspections.detail.zoneTime', {
                time: formatSeconds(visit.seconds),
                count: visit.answerCount,
              })}
            </span>
          </p>
          <div className="flex min-h-6 items-center" aria-hidden="true">
            <div
              className="h-4 rounded bg-primary"
              style={{ width: `${Math.max(2, (visit.seconds / longest) * 100)}%` }}
            />
          </div>
        </li>
      ))}
    </ol>
  );
}
