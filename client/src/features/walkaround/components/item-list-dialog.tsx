import { Dialog, DialogBackdrop, DialogPanel, DialogTitle } from '@headlessui/react';
import { useTranslation } from 'react-i18next';
import type { Checklist, ChecklistItem, ItemResult } from '@yardcall/shared';
import { Button } from '@/components/ui/button';

export interface ItemListDialogProps {
  open: boolean;
  onClose: () => void;
  checklist: Checklist;
  results: Record<string, ItemResult>;
  skipped: readonly string[];
  currentKey: string;
  onJump: (itemKey: string) => void;
}

// Every item by zone with its state; skipped ones first, so returning to them is one tap.
export function ItemListDialog({
  open,
  onClose,
  checklist,
  results,
  skipped,
  currentKey,
  onJump,
}: ItemListDialogProps) {
  const { t } = useTranslation();
  const byKey = new Map(checklist.items.map((item) => [item.key, item]));
  const skippedItems = skipped.flatMap((key) => {
    const item = byKey.get(key);
    return item && !results[key] ? [item] : [];
  });
  const status = (key: string) => {
    const result = results[key];
    if (result) return t(result.answer === 'defect' ? 'walkaround.list.defect' : 'walkaround.list.done');
    return skipped.includes(key) ? t('walkaround.list.skipped') : t('walkaround.list.open');
  };
  const jump = (key: string) => {
    onJump(key);
    onClose();
  };
  const row = (item: ChecklistItem, reactKey = item.key) => (
    <li key={reactKey}>
      <button
        type="button"
        onClick={() => jump(item.key)}
        aria-current={item.key === currentKey ? 'step' : undefined}
        className="flex min-h-tap w-full flex-col items-start rounded-lg border-2 border-line bg-surface p-3 text-left aria-[current=step]:border-4 aria-[current=step]:border-primary"
      >
        <span className="font-bold">{item.title}</span>
        <span>
          {item.positionLabel} · {status(item.key)}
        </span>
      </button>
    </li>
  );
  return (
    <Dialog open={open} onClose={onClose} className="relative z-50">
      <DialogBackdrop className="fixed inset-0 bg-black/70" />
      <div className="fixed inset-0 overflow-y-auto p-2">
        <DialogPanel className="mx-auto w-full max-w-lg rounded-xl border-2 border-line bg-page p-4 text-ink">
          <div className="mb-4 flex flex-wrap items-center justify-between gap-2">
            <DialogTitle className="text-2xl font-bold [overflow-wrap:break-word]">
              {t('walkaround.list.title')}
            </DialogTitle>
            <Button variant="secondary" className="whitespace-nowrap" onClick={onClose}>
              {t('walkaround.list.close')}
            </Button>
          </div>
          {skippedItems.length > 0 ? (
            <section aria-labelledby="skipped-heading" className="mb-6">
              <h3 id="skipped-heading" className="mb-2 text-xl font-bold">
                {t('walkaround.list.skippedTitle', { count: skippedItems.length })}
              </h3>
              <ul className="flex flex-col gap-2">{skippedItems.map((item) => row(item, `skipped-${item.key}`))}</ul>
            </section>
          ) : null}
          {checklist.zones.map((zone) => (
            <section key={zone.key} aria-labelledby={`zone-${zone.key}`} className="mb-6">
              <h3 id={`zone-${zone.key}`} className="mb-2 text-xl font-bold">
                {zone.title}
              </h3>
              <ul className="flex flex-col gap-2">
                {checklist.items.filter((item) => item.zone === zone.key).map((item) => row(item))}
              </ul>
            </section>
          ))}
        </DialogPanel>
      </div>
    </Dialog>
  );
}
