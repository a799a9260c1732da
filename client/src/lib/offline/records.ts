// The rows the phone keeps in IndexedDB: the walk-around, its answers, notes and photos, and what waits to be sent.
import type {
  Checklist,
  CreateInspectionRequest,
  InspectionVehicle,
  Locale,
  ReadingRule,
  ResultUpsert,
  SubmitInspectionRequest,
} from '@yardcall/shared';

// Opaque to this store: the voice loop saves its own state and reads it back to resume.
export type JsonValue = string | number | boolean | null | JsonValue[] | { [key: string]: JsonValue };

// IndexedDB cannot index booleans, so flags are 0/1.
export type SyncedFlag = 0 | 1;

export interface LocalInspection {
  // The client-made id is the local key and the create's idempotency key.
  clientId: string;
  serverId?: string;
  vehicles: InspectionVehicle[];
  kind: CreateInspectionRequest['kind'];
  request: CreateInspectionRequest;
  checklist: Checklist;
  // The same walk-around in the other languages a driver may switch to by voice (the same item
  // and stop keys); walk-arounds begun before these were kept go on in their own language.
  spokenChecklists?: Partial<Record<Locale, Checklist>>;
  voiceState?: JsonValue;
  // The organisation's required readings when the walk-around began (the voice loop reads them).
  requiredReadings: ReadingRule[];
  synced: SyncedFlag;
  // Signed on this device: from here the walk-around is read-only and the submit waits in the outbox.
  signed?: { request: SubmitInspectionRequest; signedAt: string };
  // When the server acknowledged the signed report.
  submittedAt?: string;
  createdAt: string;
  updatedAt: string;
}

export interface LocalResult {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  upsert: ResultUpsert;
  synced: SyncedFlag;
  // Bumped on every local write: an acknowledgement only settles the revision that was sent.
  revision: number;
  updatedAt: string;
}

// Bytes, not a Blob: an ArrayBuffer clones the same in every IndexedDB, while stored Blobs have had
// browser bugs (from memory) and do not survive fake-indexeddb under jsdom.
export interface LocalNote {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  bytes: ArrayBuffer;
  mimeType: string;
  durationMs: number;
  heard?: string;
  synced: SyncedFlag;
  serverId?: string;
  // 1 once the bytes were dropped: the server has them and the run is closed.
  freed?: SyncedFlag;
  createdAt: string;
}

export interface LocalPhoto {
  clientId: string;
  inspectionClientId: string;
  itemKey: string;
  bytes: ArrayBuffer;
  mimeType: string;
  synced: SyncedFlag;
  serverId?: string;
  freed?: SyncedFlag;
  createdAt: string;
}

export const OUTBOX_KINDS = ['inspection', 'result', 'note', 'photo', 'submit'] as const;
export type OutboxKind = (typeof OUTBOX_KINDS)[number];

// The server's answer to something that sending again cannot fix; the entry waits for the driver.
export interface Refusal {
  status: number;
  message: string;
  at: string;
}

// What is waiting to be sent, in the order it was written.
export interface OutboxEntry {
  seq?: number;
  kind: OutboxKind;
  clientId: string;
  inspectionClientId: string;
  refusal?: Refusal;
}

// Server data kept for a start with no signal (units, acknowledgements, required readings).
export interface CachedEntry {
  key: string;
  value: unknown;
  savedAt: string;
}
