import { Fragment, useState } from 'react';
import { Description, Dialog, DialogBackdrop, DialogPanel, DialogTitle } from '@headlessui/react';
import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { RetentionPurgeResult, RetentionSettings } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { describeError } from '@/lib/errors';
import { usePurgeRetention } from '@/lib/api/organizations';

const COUNTS = [
  'inspections',
  'itemResults',
  'voiceNotes',
  'photos',
  'defects',
  'repairs',
  'signatures',
  'storedObjects',
] as const satisfies readonly (keyof RetentionPurgeResult['removed'])[];

// "Purge now" asks first, then shows what was removed.
export function PurgeRecords({ settings }: { settings: RetentionSettings }) {
  const { t } = useTranslation();
  const purge = usePurgeRetention();
  const [open, setOpen] = useState(false);
  const date = useOfficeDates().date;
  const result = purge.data;

  const close = () => {
    setOpen(false);
    purge.reset();
  };

  return (
    <div className="flex max-w-xl flex-col gap-tap-gap">
      <p>{t('retention.purgeLead', { cutoff: date(settings.cutoff) })}</p>
      <div>
        <Button variant="danger" onClick={() => setOpen(true)} data-testid="purge-open">
          {t('retention.purge')}
        </Button>
      </div>
      <Dialog open={open} onClose={close} className="relative z-50">
        <DialogBackdrop className="fixed inset-0 bg-black/60" />
        <div className="fixed inset-0 flex w-screen items-start justify-center overflow-y-auto p-2 sm:p-6">
          <DialogPanel
            className="w-full max-w-lg rounded-xl border-2 border-line bg-page p-4 text-ink sm:p-6"
            data-testid="purge-dialog"
          >
            {result ? (
              <>
                <DialogTitle as="h2" className="mb-4 text-2xl font-bold">
                  {t('retention.resultTitle')}
                </DialogTitle>
                <Description className="mb-2">{t('retention.resultLead', { cutoff: date(result.cutoff) })}</Description>
                <div role="status">
                  <dl className="mb-4 grid grid-cols-[1fr_max-content] gap-x-6 gap-y-1" data-testid="purge-result">
                    {COUNTS.map((key) => (
                      <Fragment key={key}>
                        <dt>{t(`retention.removed.${key}`)}</dt>
                        <dd className="text-right font-bold" data-testid={`purge-count-${key}`}>
                          {result.removed[key]}
                        </dd>
                      </Fragment>
                    ))}
                  </dl>
                </div>
                {result.keptWithOpenDefects > 0 ? (
                  <p className="mb-4">{t('retention.kept', { count: result.keptWithOpenDefects })}</p>
                ) : null}
                <Button onClick={close}>{t('retention.done')}</Button>
              </>
            ) : (
              <>
                <DialogTitle as="h2" className="mb-4 text-2xl font-bold">
                  {t('retention.confirmTitle')}
                </DialogTitle>
                <Description className="mb-4">
                  {t('retention.confirmBody', { cutoff: date(settings.cutoff) })}
                </Description>
                {purge.isError ? (
                  <div className="mb-4">
                    <ErrorAlert>{describeError(purge.error)}</ErrorAlert>
                  </div>
                ) : null}
                <div className="flex flex-wrap gap-tap-gap">
                  <Button
                    variant="danger"
                    busy={purge.isPending}
                    onClick={() => purge.mutate()}
                    data-testid="purge-confirm"
                  >
                    {t('retention.confirm')}
                  </Button>
                  <Button variant="secondary" onClick={close}>
                    {t('common.cancel')}
                  </Button>
                </div>
              </>
            )}
          </DialogPanel>
        </div>
      </Dialog>
    </div>
  );
}
