import { useTranslation } from 'react-i18next';
import type { DefectResponse } from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/layout';
import { DefectFacts } from './defect-facts';
import { NotePlayer } from './note-player';
import { RepairForm } from './repair-form';
import { SafetyCaution } from '@/components/ui/safety-caution';

export function SafetyMark({ safety }: { safety: boolean }) {
  const { t } = useTranslation();
  return safety ? (
    <span className="inline-flex items-center gap-1 rounded-full border-2 border-danger px-3 py-1 font-bold text-danger">
      <span aria-hidden="true">✖</span>
      {t('mechanic.defect.safety')}
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 rounded-full border-2 border-line px-3 py-1 font-bold">
      {t('mechanic.defect.notSafety')}
    </span>
  );
}

// One open defect: what the driver found, their note, and the certification when the mechanic opens it.
export function DefectCard({
  defect,
  editing,
  onEdit,
  onClose,
  onCertified,
}: {
  defect: DefectResponse;
  editing: boolean;
  onEdit: () => void;
  onClose: () => void;
  onCertified: (certified: DefectResponse) => void;
}) {
  const { t } = useTranslation();
  const headingId = `defect-${defect.id}-title`;
  return (
    <Card>
      <article aria-labelledby={headingId} data-testid="open-defect" data-defect-id={defect.id}>
        <div className="mb-2 flex flex-wrap items-start justify-between gap-2">
          <h4 id={headingId} className="text-xl font-bold">
            {defect.title} — {defect.positionLabel}
          </h4>
          <SafetyMark safety={defect.safety} />
        </div>
        <DefectFacts defect={defect} />
        <div className="mt-3">
          <NotePlayer inspectionId={defect.inspectionId} itemKey={defect.itemKey} />
        </div>
        {defect.safety ? (
          <div className="mt-3">
            <SafetyCaution />
          </div>
        ) : null}
        {editing ? (
          <RepairForm defect={defect} onCertified={onCertified} onCancel={onClose} />
        ) : (
          <div className="mt-4">
            <Button onClick={onEdit} data-testid="record-repair">
              {t('mechanic.record')}
            </Button>
          </div>
        )}
      </article>
    </Card>
  );
}
