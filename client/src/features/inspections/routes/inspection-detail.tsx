import { useCallback, useRef } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageHeading, Section } from '@/components/ui/layout';
import { saveBlob } from '@/lib/audio/save-blob';
import type { WaveformHandle } from '@/lib/audio/waveform-player';
import { describeError } from '@/lib/errors';
import { inspectionQueryOptions, useInspection, useReportPdf } from '@/lib/api/inspections';
import { FixedOnTheSpot } from '../components/fixed-on-the-spot';
import { InspectionFacts, InspectionFlags, inspectionTitle } from '../components/inspection-header';
import { InspectionItems } from '../components/inspection-items';
import { InspectionNotes } from '../components/inspection-notes';
import { InspectionTimeline } from '../components/inspection-timeline';
import { SafetyCaution } from '@/components/ui/safety-caution';

export function inspectionDetailLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    await queryClient.prefetchQuery(inspectionQueryOptions(params.inspectionId ?? ''));
    return null;
  };
}

export function InspectionDetailRoute() {
  const { t } = useTranslation();
  const { inspectionId = '' } = useParams();
  const inspection = useInspection(inspectionId);
  const pdf = useReportPdf();
  const players = useRef(new Map<string, WaveformHandle>());

  const registerPlayer = useCallback((noteId: string, handle: WaveformHandle | null) => {
    if (handle) players.current.set(noteId, handle);
    else players.current.delete(noteId);
  }, []);

  // From an item to its note: bring the player into view, move focus there and play from the start.
  const playNote = useCallback((noteId: string) => {
    document.getElementById(`note-${noteId}`)?.scrollIntoView({ block: 'center' });
    const player = players.current.get(noteId);
    player?.focus();
    player?.play(0);
  }, []);

  if (inspection.isPending) return <Loading label={t('common.loading')} />;
  if (inspection.isError) return <ErrorAlert>{describeError(inspection.error)}</ErrorAlert>;
  const data = inspection.data;

  const downloadPdf = () =>
    pdf.mutate(data.id, {
      onSuccess: (blob) => saveBlob(blob, `yardcall-report-${inspectionTitle(data).replace(/[^\w-]+/g, '_')}.pdf`),
    });

  return (
    <div data-testid="inspection-detail">
      <p className="mb-2">
        <Link to="/supervisor/inspections">
          <span aria-hidden="true">← </span>
          {t('inspections.detail.back')}
        </Link>
      </p>
      <PageHeading
        title={t('inspections.detail.title', {
          units: inspectionTitle(data),
          kind: t(`inspections.kinds.${data.kind}`),
        })}
        actions={
          data.status === 'submitted' ? (
            <Button variant="secondary" onClick={downloadPdf} busy={pdf.isPending} data-testid="download-pdf">
              <span aria-hidden="true">⇩</span>
              {t('inspections.detail.downloadPdf')}
            </Button>
          ) : null
        }
      />
      {pdf.isError ? <ErrorAlert>{describeError(pdf.error)}</ErrorAlert> : null}
      <Section title={t('inspections.detail.facts')} id="inspection-summary">
        <InspectionFacts inspection={data} />
      </Section>
      <Section title={t('inspections.detail.flags')} id="inspection-review-flags">
        <InspectionFlags inspection={data} />
      </Section>
      <Section title={t('inspections.detail.route')} id="inspection-route">
        <InspectionTimeline visits={data.timeline} />
      </Section>
      <Section title={t('inspections.detail.fixes')} id="inspection-fixes">
        <FixedOnTheSpot inspection={data} />
      </Section>
      <Section title={t('inspections.detail.items')} id="inspection-answers">
        <div className="mb-4">
          <SafetyCaution />
        </div>
        <InspectionItems inspection={data} onPlayNote={playNote} />
      </Section>
      <Section title={t('inspections.detail.notes')} id="inspection-voice-notes">
        <InspectionNotes notes={data.notes} items={data.checklist.items} registerPlayer={registerPlayer} />
      </Section>
    </div>
  );
}
