import { LOCALES, buildChecklist, type Checklist, type Locale } from '@yardcall/shared';
import { getOfflineRuntime, type LocalInspection } from '@/lib/offline';
import type { NewWalkaround } from './create-local-inspection';

// The checklist is built here from the same shared rules the server uses, so the walk-around starts
// with no signal; the create goes to the server through the sync engine, keyed by its client id.
// Loaded on the tap that starts a walk-around: the checklist's words stay off the start screen's first load.
export async function buildLocalInspection({
  vehicles,
  kind,
  locale,
  requiredReadings,
}: NewWalkaround): Promise<LocalInspection> {
  const units = vehicles.map((v) => ({ unitNumber: v.unitNumber, kind: v.kind, config: v.config }));
  const checklist = buildChecklist(units, kind, locale);
  // The driver may say "español" or "English" mid-walk-around: the prompts follow.
  const spokenChecklists: Partial<Record<Locale, Checklist>> = {};
  for (const other of LOCALES) if (other !== locale) spokenChecklists[other] = buildChecklist(units, kind, other);
  const clientId = crypto.randomUUID();
  return getOfflineRuntime().store.saveInspection({
    request: { clientId, vehicleIds: vehicles.map((v) => v.id), kind, locale, startedAt: new Date().toISOString() },
    vehicles: vehicles.map((v) => ({ id: v.id, unitNumber: v.unitNumber, kind: v.kind })),
    checklist,
    spokenChecklists,
    requiredReadings,
  });
}
