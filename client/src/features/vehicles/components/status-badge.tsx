import { useTranslation } from 'react-i18next';
import type { VehicleStatus } from '@yardcall/shared';

// Told by word and mark, not by colour alone.
export function StatusBadge({ status }: { status: VehicleStatus }) {
  const { t } = useTranslation();
  const out = status === 'out_of_service';
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-full border-2 px-3 py-1 font-bold ${
        out ? 'border-danger text-danger' : 'border-ok text-ok'
      }`}
      data-testid="vehicle-status"
      data-status={status}
    >
      <span aria-hidden="true">{out ? '✖' : '✔'}</span>
      {t(`vehicles.statuses.${status}`)}
    </span>
  );
}
