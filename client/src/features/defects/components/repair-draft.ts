import type { CertificationAction, RepairRequest } from '@yardcall/shared';

export interface RepairDraft {
  action: CertificationAction | null;
  note: string;
  // YYYY-MM-DD from the date field; only for a deferral.
  deferredUntil: string;
  name: string;
  drawing: string | null;
}

export type RepairProblem =
  'actionNeeded' | 'deferSafety' | 'noteNeeded' | 'dateNeeded' | 'dateFuture' | 'nameNeeded' | 'signatureNeeded';

export type RepairProblems = Partial<Record<'action' | 'note' | 'deferredUntil' | 'name' | 'drawing', RepairProblem>>;

export const EMPTY_REPAIR_DRAFT: RepairDraft = { action: null, note: '', deferredUntil: '', name: '', drawing: null };

// The local calendar date, as a date field gives it.
export function localDateString(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

// The same checks the server makes, said before the round trip. A defect that affects safe operation
// must be repaired or certified as needing none before the vehicle is driven (49 CFR 396.11(a)(3)).
export function checkRepairDraft(
  draft: RepairDraft,
  { safety, today }: { safety: boolean; today: Date },
): RepairProblems {
  const problems: RepairProblems = {};
  if (draft.action === null) problems.action = 'actionNeeded';
  else if (draft.action === 'deferred' && safety) problems.action = 'deferSafety';
  if (draft.note.trim() === '') problems.note = 'noteNeeded';
  if (draft.action === 'deferred') {
    if (draft.deferredUntil === '') problems.deferredUntil = 'dateNeeded';
    else if (draft.deferredUntil <= localDateString(today)) problems.deferredUntil = 'dateFuture';
  }
  if (draft.name.trim() === '') problems.name = 'nameNeeded';
  if (!draft.drawing) problems.drawing = 'signatureNeeded';
  return problems;
}

// A deferral lasts to the end of the chosen local day.
export function toRepairRequest(draft: RepairDraft & { action: CertificationAction }): RepairRequest {
  return {
    action: draft.action,
    note: draft.note.trim(),
    ...(draft.action === 'deferred'
      ? { deferredUntil: new Date(`${draft.deferredUntil}T23:59:59`).toISOString() }
      : {}),
    signature: { name: draft.name.trim(), ...(draft.drawing ? { drawing: draft.drawing } : {}) },
  };
}
