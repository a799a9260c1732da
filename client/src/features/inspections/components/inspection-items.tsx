import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import type {
  ChecklistItem,
  DefectResponse,
  InspectionResponse,
  ItemResultResponse,
  VoiceNoteResponse,
} from '@yardcall/shared';
import { Button } from '@/components/ui/button';
import { CheckboxField } from '@/components/ui/field';

export interface InspectionItemsProps {
  inspection: InspectionResponse;
  onPlayNote: (noteId: string) => void;
}

function groupBy<T>(values: T[], key: (value: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const value of values) {
    const k = key(value);
    groups.set(k, [...(groups.get(k) ?? []), value]);
  }
  return groups;
}

// Trouble is told with a mark and words as well as colour.
function isTrouble(result: ItemResultResponse | undefined): boolean {
  return result?.answer === 'defect' || result?.verdict === 'out_of_limit';
}

function AnswerText({ result }: { result: ItemResultResponse | undefined }) {
  const { t } = useTranslation();
  if (!result) return <span className="text-muted">{t('inspections.items.notAnswered')}</span>;
  const mark = result.answer === 'pass' ? '✔' : result.answer === 'defect' ? '✖' : '–';
  return (
    <span className={result.answer === 'defect' ? 'font-bold text-danger' : 'font-bold'}>
      <span aria-hidden="true">{mark} </span>
      {t(`inspections.answers.${result.answer}`)}
    </span>
  );
}

function VerdictText({ result }: { result: ItemResultResponse }) {
  const { t } = useTranslation();
  if (!result.verdict) return null;
  const mark = result.verdict === 'ok' ? '✔' : result.verdict === 'near_limit' ? '◐' : '⚠';
  const measured = result.measurement ? `${result.measurement.value} ${result.measurement.unit}` : '';
  return (
    <p className={result.verdict === 'out_of_limit' ? 'font-bold text-danger' : ''} data-testid="item-verdict">
      <span aria-hidden="true">{mark} </span>
      {t(`inspections.verdicts.${result.verdict}`)}
      {measured ? `: ${measured}` : ''}
      {result.limit
        ? ` (${t('inspections.items.limit', { value: result.limit.value, unit: result.limit.unit, source: result.limit.source })})`
        : ''}
    </p>
  );
}

function ItemRow({
  item,
  result,
  notes,
  defects,
  onPlayNote,
}: {
  item: ChecklistItem;
  result: ItemResultResponse | undefined;
  notes: VoiceNoteResponse[];
  defects: DefectResponse[];
  onPlayNote: (noteId: string) => void;
}) {
  const { t } = useTranslation();
  const trouble = isTrouble(result);
  return (
    <li
      className={`flex flex-col gap-1 rounded-lg bg-surface p-3 ${trouble ? 'border-4 border-danger' : 'border-2 border-line'}`}
      data-testid="inspection-item"
      data-item-key={item.key}
      data-trouble={trouble}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p>
          {trouble ? (
            <span className="font-bold text-danger">
              <span aria-hidden="true">⚠ </span>
              {t('inspections.items.attention')}{' '}
            </span>
          ) : null}
          <span className="font-bold">{item.title}</span> <span className="text-muted">· {item.positionLabel}</span>
          {item.safety ? <span className="ml-2 text-muted">({t('inspections.items.safety')})</span> : null}
        </p>
        <AnswerText result={result} />
      </div>
      {result ? <VerdictText result={result} /> : null}
      {result?.heard ? (
        <p data-testid="item-heard">
          <span className="font-bold">{t('inspections.items.heard')}</span> “{result.heard}”
          {result.confidence !== null ? (
            <span className="text-muted">
              {' '}
              {t('inspections.items.confidence', { percent: Math.round(result.confidence * 100) })}
            </span>
          ) : null}
        </p>
      ) : null}
      {result?.detail ? (
        <p>
          <span className="font-bold">{t('inspections.items.detail')}</span> {result.detail}
        </p>
      ) : null}
      {defects.map((defect) => (
        <p key={defect.id} className="font-bold">
          <span aria-hidden="true">⚒ </span>
          {t('inspections.items.defectStatus', { status: t(`inspections.defectStatuses.${defect.status}`) })}
        </p>
      ))}
      {notes.length > 0 ? (
        <div className="flex flex-wrap gap-tap-gap">
          {notes.map((note, index) => (
            <Button
              key={note.id}
              variant="secondary"
              onClick={() => onPlayNote(note.id)}
              data-testid="play-item-note"
              aria-controls={`note-${note.id}`}
            >
              <span aria-hidden="true">▶</span>
              {notes.length > 1
                ? t('inspections.items.playNoteNumber', { number: index + 1, title: item.title })
                : t('inspections.items.playNote', { title: item.title })}
            </Button>
          ))}
        </div>
      ) : null}
    </li>
  );
}

// Every checklist item with its answer, what was heard and the verdict, grouped by zone.
export function InspectionItems({ inspection, onPlayNote }: InspectionItemsProps) {
  const { t } = useTranslation();
  const results = new Map(inspection.results.map((result) => [result.itemKey, result]));
  const notesByItem = groupBy(inspection.notes, (note) => note.itemKey);
  const defectsByItem = groupBy(inspection.defects, (defect) => defect.itemKey);
  const itemsByZone = groupBy(inspection.checklist.items, (item) => item.zone);
  const troubleCount = inspection.checklist.items.filter((item) => isTrouble(results.get(item.key))).length;
  // A full walk-around has a hundred items or more: the reviewer may narrow to what matters.
  const [focused, setFocused] = useState(false);
  const shown = (item: ChecklistItem) =>
    !focused || isTrouble(results.get(item.key)) || notesByItem.has(item.key) || defectsByItem.has(item.key);

  return (
    <div className="flex flex-col gap-6" data-testid="inspection-items">
      <p role="status" className="font-bold">
        {troubleCount > 0
          ? t('inspections.items.troubleCount', { count: troubleCount })
          : t('inspections.items.noTrouble')}
      </p>
      <CheckboxField
        label={t('inspections.items.onlyAttention')}
        checked={focused}
        onChange={(event) => setFocused(event.target.checked)}
        data-testid="only-attention"
      />
      {inspection.checklist.zones.map((zone) => {
        const items = (itemsByZone.get(zone.key) ?? []).filter(shown);
        if (items.length === 0) return null;
        const headingId = `zone-${zone.key}`;
        return (
          <section key={zone.key} aria-labelledby={headingId} data-testid="item-zone">
            <h3 id={headingId} className="mb-2 text-xl font-bold">
              {zone.title}
            </h3>
            <ul className="flex flex-col gap-2">
              {items.map((item) => (
                <ItemRow
                  key={item.key}
                  item={item}
                  result={results.get(item.key)}
                  notes={notesByItem.get(item.key) ?? []}
                  defects={defectsByItem.get(item.key) ?? []}
                  onPlayNote={onPlayNote}
                />
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
