import { useTranslation } from 'react-i18next';
import { formatMeasure, type InspectionResponse, type Locale } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { Card, EmptyState, Section } from '@/components/ui/layout';
import { describeError } from '@/lib/errors';
import { useReportPdf } from '@/lib/api/inspections';
import { SafetyCaution } from '@/components/ui/safety-caution';

// The signed report as the server stored it: its defects and the PDF.
export function ReportView({ inspection }: { inspection: InspectionResponse }) {
  const { t, i18n } = useTranslation();
  const locale: Locale = i18n.language === 'es' ? 'es' : 'en';
  const pdf = useReportPdf();
  const units = inspection.vehicles.map((v) => v.unitNumber).join(', ');

  const download = () => {
    pdf.mutate(inspection.id, {
      onSuccess: (blob) => {
        const url = URL.createObjectURL(blob);
        const link = document.createElement('a');
        link.href = url;
        link.download = `yardcall-report-${units.replace(/[^\w-]+/g, '_')}.pdf`;
        link.click();
        setTimeout(() => URL.revokeObjectURL(url), 60_000);
      },
    });
  };

  return (
    <div data-testid="report-view">
      <h1 className="mb-2 text-3xl font-bold">{t('walkaround.report.title', { units })}</h1>
      <p className="mb-6 text-xl font-bold">
        {inspection.summary.mayBeDriven ? t('walkaround.report.mayBeDriven') : t('walkaround.report.parked')}
      </p>
      <Section title={t('walkaround.report.defects', { count: inspection.defects.length })} id="report-defects">
        {inspection.defects.length === 0 ? (
          <EmptyState title={t('walkaround.report.noDefects')} />
        ) : (
          <ul className="flex flex-col gap-tap-gap">
            {inspection.defects.map((defect) => (
              <li key={defect.id}>
                <Card>
                  <p className="text-xl font-bold">
                    {defect.title} — {defect.positionLabel}
                  </p>
                  {defect.detail ? <p>{defect.detail}</p> : null}
                  {defect.measurement ? (
                    <p>
                      {formatMeasure(defect.measurement.value, defect.measurement.unit, locale)}
                      {defect.limit
                        ? ` (${t('walkaround.report.limit')} ${defect.limit.value} ${defect.limit.unit}, ${defect.limit.source})`
                        : ''}
                    </p>
                  ) : null}
                </Card>
              </li>
            ))}
          </ul>
        )}
        {inspection.defects.some((d) => d.safety) ? (
          <div className="mt-4">
            <SafetyCaution />
          </div>
        ) : null}
      </Section>
      <div className="flex flex-col gap-tap-gap">
        {pdf.isError ? <ErrorAlert>{describeError(pdf.error)}</ErrorAlert> : null}
        <Button size="large" onClick={download} busy={pdf.isPending} data-testid="download-pdf">
          {t('walkaround.report.download')}
        </Button>
        <LinkButton to="/driver" variant="secondary">
          {t('walkaround.report.home')}
        </LinkButton>
      </div>
    </div>
  );
}
