import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import type {
  ChecklistItem,
  ChecklistStop,
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

// Trouble is told with a mark and words as well as colour. A defect the shared summary counts as fixed
// on the spot is on the record (see FixedOnTheSpot) but needs no one's attention.
function isTrouble(result: ItemResultResponse | undefined, fixedOnTheSpot: boolean): boolean {
  return !fixedOnTheSpot && (result?.answer === 'defect' || result?.verdict === 'out_of_limit');
}

function AnswerText({ result, fixedOnTheSpot }: { result: ItemResultResponse | undefined; fixedOnTheSpot: boolean }) {
  const { t } = useTranslation();
  if (!result) return <span className="text-muted">{t('inspections.items.notAnswered')}</span>;
  if (fixedOnTheSpot) {
    return (
      <span className="font-bold">
        <span aria-hidden="true">✔ </span>
        {t('inspections.items.fixed')}
      </span>
    );
  }
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

function SpotFixText({ fix }: { fix: NonNullable<ItemResultResponse['fixed']> }) {
  const { t } = useTranslation();
  return (
    <div data-testid="item-fixed">
      <p>{t('inspections.items.fixedAction', { action: fix.action })}</p>
      {fix.measurement ? (
        <p>
          {t('inspections.items.newReading', { value: fix.measurement.value, unit: fix.measurement.unit })}
          {fix.verdict ? ` (${t(`inspections.verdicts.${fix.verdict}`)})` : ''}
        </p>
      ) : null}
    </div>
  );
}

// The zone's items under their stops (the places the driver stopped at), in walk order. Items a
// stop does not name (a checklist from before stops) stay under the zone itself.
function stopsOfZone(
  zoneKey: string,
  items: ChecklistItem[],
  stops: readonly ChecklistStop[] | undefined,
): { stop: ChecklistStop | null; items: ChecklistItem[] }[] {
  const byKey = new Map(items.map((item) => [item.key, item]));
  const groups: { stop: ChecklistStop | null; items: ChecklistItem[] }[] = [];
  for (const stop of (stops ?? []).filter((s) => s.zone === zoneKey)) {
    const stopItems = stop.itemKeys.flatMap((key) => {
      const item = byKey.get(key);
      if (!item) return [];
      byKey.delete(key);
      return [item];
    });
    if (stopItems.length > 0) groups.push({ stop, items: stopItems });
  }
  const loose = items.filter((item) => byKey.has(item.key));
  if (loose.length > 0) groups.push({ stop: null, items: loose });
  return groups;
}

function ItemRow({
  item,
  result,
  fixedOnTheSpot,
  notes,
  defects,
  onPlayNote,
}: {
  item: ChecklistItem;
  result: ItemResultResponse | undefined;
  fixedOnTheSpot: boolean;
  notes: VoiceNoteResponse[];
  defects: DefectResponse[];
  onPlayNote: (noteId: string) => void;
}) {
  const { t } = useTranslation();
  const trouble = isTrouble(result, fixedOnTheSpot);
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
        <AnswerText result={result} fixedOnTheSpot={fixedOnTheSpot} />
      </div>
      {result ? <VerdictText result={result} /> : null}
      {result?.noReading ? (
        <p className={result.noReading === 'no_gauge' ? 'font-bold' : ''} data-testid="item-no-reading">
          <span aria-hidden="true">○ </span>
          {t(`inspections.items.noReading.${result.noReading}`)}
        </p>
      ) : null}
      {result?.fixed ? <SpotFixText fix={result.fixed} /> : null}
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

// Every checklist item with its answer, what was heard and the verdict, grouped by zone and stop.
export function InspectionItems({ inspection, onPlayNote }: InspectionItemsProps) {
  const { t } = useTranslation();
  const results = new Map(inspection.results.map((result) => [result.itemKey, result]));
  const notesByItem = groupBy(inspection.notes, (note) => note.itemKey);
  const defectsByItem = groupBy(inspection.defects, (defect) => defect.itemKey);
  const itemsByZone = groupBy(inspection.checklist.items, (item) => item.zone);
  const fixedKeys = new Set(inspection.summary.fixedOnTheSpot.map((fix) => fix.itemKey));
  const troubled = (item: ChecklistItem) => isTrouble(results.get(item.key), fixedKeys.has(item.key));
  const troubleCount = inspection.checklist.items.filter(troubled).length;
  const { checkedWithoutReading, noGauge } = inspection.summary;
  // A full walk-around has a hundred items or more: the reviewer may narrow to what matters.
  const [focused, setFocused] = useState(false);
  const shown = (item: ChecklistItem) =>
    !focused || troubled(item) || notesByItem.has(item.key) || defectsByItem.has(item.key);

  return (
    <div className="flex flex-col gap-6" data-testid="inspection-items">
      <p role="status" className="font-bold">
        {troubleCount > 0
          ? t('inspections.items.troubleCount', { count: troubleCount })
          : t('inspections.items.noTrouble')}
      </p>
      {checkedWithoutReading.length + noGauge.length > 0 ? (
        <p data-testid="without-reading-count">
          {t('inspections.items.withoutReading', {
            visual: checkedWithoutReading.length,
            noGauge: noGauge.length,
          })}
        </p>
      ) : null}
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
        const row = (item: ChecklistItem) => (
          <ItemRow
            key={item.key}
            item={item}
            result={results.get(item.key)}
            fixedOnTheSpot={fixedKeys.has(item.key)}
            notes={notesByItem.get(item.key) ?? []}
            defects={defectsByItem.get(item.key) ?? []}
            onPlayNote={onPlayNote}
          />
        );
        return (
          <section key={zone.key} aria-labelledby={headingId} data-testid="item-zone">
            <h3 id={headingId} className="mb-2 text-xl font-bold">
              {zone.title}
            </h3>
            <div className="flex flex-col gap-4">
              {stopsOfZone(zone.key, items, inspection.checklist.stops).map(({ stop, items: stopItems }) =>
                stop ? (
                  <section
                    key={stop.key}
                    aria-labelledby={`stop-${stop.key}`}
                    data-testid="item-stop"
                    data-stop-key={stop.key}
                  >
                    <h4 id={`stop-${stop.key}`} className="mb-2 text-lg font-bold">
                      {stop.label}
                    </h4>
                    <ul className="flex flex-col gap-2">{stopItems.map(row)}</ul>
                  </section>
                ) : (
                  <ul key="loose" className="flex flex-col gap-2">
                    {stopItems.map(row)}
                  </ul>
                ),
              )}
            </div>
          </section>
        );
      })}
    </div>
  );
}
