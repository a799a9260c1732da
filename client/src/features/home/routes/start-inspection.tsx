import { useState, type ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { Notice } from '@/components/ui/alert';
import { LinkButton } from '@/components/ui/button';
import { PageHeading, Section } from '@/components/ui/layout';

// The walk-around itself comes later: for now the driver picks the unit and is told what comes next.
export function StartInspection({ renderPicker }: { renderPicker: (onPicked: (unit: string) => void) => ReactNode }) {
  const { t } = useTranslation();
  const [picked, setPicked] = useState<string | null>(null);
  return (
    <div data-testid="start-inspection-screen">
      <PageHeading title={t('start.title')} lead={t('start.lead')} />
      {picked ? (
        <div className="mb-6 flex flex-col gap-tap-gap">
          <Notice>{t('start.picked', { unit: picked })}</Notice>
          <div>
            <LinkButton to="/driver" variant="secondary">
              {t('start.back')}
            </LinkButton>
          </div>
        </div>
      ) : null}
      <Section title={t('start.vehicles')} id="start-vehicles">
        {renderPicker(setPicked)}
      </Section>
    </div>
  );
}
