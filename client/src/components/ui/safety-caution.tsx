import { useTranslation } from 'react-i18next';

// Shown beside every verdict on brakes, tires, wheels, steering, air and coupling.
export function SafetyCaution() {
  const { t } = useTranslation();
  return (
    <p className="rounded-lg border-2 border-accent p-3 text-base" data-testid="safety-caution">
      <span aria-hidden="true">⚠ </span>
      {t('walkaround.caution')}
    </p>
  );
}
