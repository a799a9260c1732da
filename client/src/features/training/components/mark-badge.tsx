import { useTranslation } from 'react-i18next';
import type { TrainingGrade, TrainingItemMarkValue } from '@yardcall/shared';

const MARK_STYLE: Record<TrainingItemMarkValue, { icon: string; className: string }> = {
  named: { icon: '✓', className: 'border-ok text-ok' },
  partly: { icon: '◐', className: 'border-accent text-ink' },
  missed: { icon: '✗', className: 'border-danger text-danger' },
};

// A mark in words with its own sign, so it is never told by colour alone.
export function MarkBadge({ mark, testId }: { mark: TrainingItemMarkValue; testId?: string }) {
  const { t } = useTranslation();
  const style = MARK_STYLE[mark];
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-md border-2 px-2 font-bold ${style.className}`}
      data-testid={testId}
      data-mark={mark}
    >
      <span aria-hidden="true">{style.icon}</span>
      {t(`training.mark.${mark}`)}
    </span>
  );
}

export function GradeBadge({ grade }: { grade: TrainingGrade | null }) {
  const { t } = useTranslation();
  if (!grade) return <span className="text-muted">{t('training.grade.none')}</span>;
  return (
    <span className="inline-flex items-center rounded-md border-2 border-line px-2 font-bold" data-grade={grade}>
      {t(`training.grade.${grade}`)}
    </span>
  );
}
