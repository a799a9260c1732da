import { useTranslation } from 'react-i18next';
import {
  TRAINING_ITEM_MARKS,
  type NarratedItem,
  type TrainingAttemptResponse,
  type TrainingItemMarkValue,
} from '@yardcall/shared';
import { formatClock } from './format';
import { MarkBadge } from './mark-badge';

export interface ItemDraft {
  mark: TrainingItemMarkValue;
  comment: string;
}

export interface AttemptChecklistProps {
  attempt: TrainingAttemptResponse;
  // Seek the recording to this moment (ms from its start).
  onSeek?: (ms: number) => void;
  // Present: the trainer edits a mark and a comment per item.
  drafts?: Record<string, ItemDraft>;
  onDraftChange?: (itemKey: string, draft: ItemDraft) => void;
}

// The checklist by zone and stop, as the walk-around asks it, each item with the scorer's mark, when
// it was named, and the trainer's mark.
export function AttemptChecklist({ attempt, onSeek, drafts, onDraftChange }: AttemptChecklistProps) {
  const { t } = useTranslation();
  const scored = new Map<string, NarratedItem>((attempt.score?.items ?? []).map((item) => [item.itemKey, item]));
  const reviewed = new Map((attempt.review?.marks ?? []).map((mark) => [mark.itemKey, mark]));
  const coverage = new Map((attempt.score?.zones ?? []).map((zone) => [zone.zone, zone]));
  const stopsOf = (zone: string) => attempt.checklist.stops.filter((stop) => stop.zone === zone);

  return (
    <div className="flex flex-col gap-6" data-testid="attempt-checklist">
      {attempt.checklist.zones.map((zone) => {
        const items = attempt.checklist.items.filter((item) => item.zone === zone.key);
        if (items.length === 0) return null;
        const zoneScore = coverage.get(zone.key);
        const headingId = `zone-${zone.key}`;
        return (
          <section key={zone.key} aria-labelledby={headingId} data-testid={`zone-${zone.key}`}>
            <h3 id={headingId} className="mb-2 text-xl font-bold">
              {zone.title}
              {zoneScore ? (
                <span className="ml-2 text-base font-normal text-muted">
                  {t('training.attempt.zoneCount', { named: zoneScore.named, total: zoneScore.itemCount })}
                </span>
              ) : null}
            </h3>
            {stopsOf(zone.key).map((stop) => (
              <div key={stop.key} className="mt-3" data-testid="attempt-stop">
                <h4 className="mb-1 text-lg font-bold">{stop.label}</h4>
                <ul className="flex flex-col gap-2">
                  {items
                    .filter((item) => item.stopKey === stop.key)
                    .map((item) => {
                      const score = scored.get(item.key);
                      const status = score?.status ?? 'missed';
                      const trainerMark = reviewed.get(item.key);
                      const draft = drafts?.[item.key];
                      const when = score?.firstNamedMs ?? null;
                      const label = `${item.title}, ${item.positionLabel}`;
                      return (
                        <li
                          key={item.key}
                          className="rounded-xl border-2 border-line bg-surface p-3"
                          data-testid="attempt-item"
                          data-item-key={item.key}
                          data-status={status}
                        >
                          <div className="flex flex-wrap items-center justify-between gap-2">
                            <div className="min-w-0">
                              <p className="font-bold">{item.title}</p>
                              <p className="text-muted">{item.positionLabel}</p>
                            </div>
                            <div className="flex flex-wrap items-center gap-2">
                              <MarkBadge mark={status} testId="item-status" />
                              {when !== null && onSeek ? (
                                <button
                                  type="button"
                                  className="inline-flex min-h-tap items-center gap-1 rounded-lg border-2 border-line px-3 font-bold hover:border-ink"
                                  onClick={() => onSeek(when)}
                                  aria-label={t('training.attempt.playAtLabel', {
                                    item: label,
                                    time: formatClock(when),
                                  })}
                                  data-testid="item-play"
                                  data-ms={when}
                                >
                                  <span aria-hidden="true">▶</span>
                                  {formatClock(when)}
                                </button>
                              ) : null}
                            </div>
                          </div>
                          {score?.heardIn ? (
                            <p className="mt-1 italic">
                              {t('training.attempt.heardIn')} “{score.heardIn}”
                            </p>
                          ) : null}
                          {draft && onDraftChange ? (
                            <div className="mt-2 grid gap-2 sm:grid-cols-[12rem_1fr]">
                              <div className="flex flex-col gap-1">
                                <label htmlFor={`mark-${item.key}`} className="font-bold">
                                  {t('training.review.markLabel')}
                                  <span className="sr-only">: {label}</span>
                                </label>
                                <select
                                  id={`mark-${item.key}`}
                                  value={draft.mark}
                                  onChange={(event) =>
                                    onDraftChange(item.key, {
                                      ...draft,
                                      mark: event.target.value as TrainingItemMarkValue,
                                    })
                                  }
                                  className="block min-h-tap w-full rounded-lg border-2 border-line bg-surface px-3 text-ink"
                                  data-testid="item-mark"
                                >
                                  {TRAINING_ITEM_MARKS.map((mark) => (
                                    <option key={mark} value={mark}>
                                      {t(`training.mark.${mark}`)}
                                    </option>
                                  ))}
                                </select>
                              </div>
                              <div className="flex flex-col gap-1">
                                <label htmlFor={`comment-${item.key}`} className="font-bold">
                                  {t('training.review.itemComment')}
                                  <span className="sr-only">: {label}</span>
                                </label>
                                <input
                                  id={`comment-${item.key}`}
                                  value={draft.comment}
                                  onChange={(event) =>
                                    onDraftChange(item.key, { ...draft, comment: event.target.value })
                                  }
                                  className="block min-h-tap w-full rounded-lg border-2 border-line bg-surface px-3 text-ink"
                                  data-testid="item-comment"
                                />
                              </div>
                            </div>
                          ) : trainerMark ? (
                            <div className="mt-2 flex flex-wrap items-center gap-2" data-testid="item-feedback">
                              <span className="font-bold">{t('training.feedback.trainerMark')}</span>
                              <MarkBadge mark={trainerMark.mark} />
                              {trainerMark.comment ? <span>{trainerMark.comment}</span> : null}
                            </div>
                          ) : null}
                        </li>
                      );
                    })}
                </ul>
              </div>
            ))}
          </section>
        );
      })}
    </div>
  );
}
