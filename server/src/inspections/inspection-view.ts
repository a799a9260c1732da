import type {
  InspectionListItem,
  InspectionVehicle,
  ItemResult as SharedItemResult,
  ItemResultResponse,
  SignatureResponse,
} from '@yardcall/shared';
import type { VehicleSnapshot } from '../vehicles/vehicle-checklist';
import type { Inspection } from './entities/inspection.entity';
import type { ItemResult } from './entities/item-result.entity';
import type { Signature } from './entities/signature.entity';

export function toVehicleRefs(snapshot: readonly VehicleSnapshot[]): InspectionVehicle[] {
  return snapshot.map((v) => ({ id: v.id, unitNumber: v.unitNumber, kind: v.kind }));
}

export function toListItem(inspection: Inspection, driverName: string): InspectionListItem {
  return {
    id: inspection.id,
    kind: inspection.kind,
    status: inspection.status,
    startedAt: inspection.startedAt.toISOString(),
    submittedAt: inspection.submittedAt?.toISOString() ?? null,
    driver: { id: inspection.driverId, name: driverName },
    vehicles: toVehicleRefs(inspection.vehicles),
    defectCount: inspection.defectCount,
    rushed: inspection.rushed,
    recurringDefect: inspection.recurringDefect,
    durationSeconds: inspection.durationSeconds,
  };
}

export function toResultResponse(row: ItemResult): ItemResultResponse {
  return {
    id: row.id,
    clientId: row.clientId,
    itemKey: row.itemKey,
    answer: row.answer,
    measurement:
      row.measurementQuantity !== null && row.measurementValue !== null && row.measurementUnit !== null
        ? { quantity: row.measurementQuantity, value: row.measurementValue, unit: row.measurementUnit }
        : null,
    verdict: row.verdict,
    limit:
      row.limitValue !== null && row.limitUnit !== null && row.limitSource !== null
        ? { value: row.limitValue, unit: row.limitUnit, source: row.limitSource }
        : null,
    noReading: row.noReading,
    fixed: row.fixed,
    detail: row.detail,
    heard: row.heard,
    confidence: row.confidence,
    answeredAt: row.answeredAt.toISOString(),
  };
}

// The stored answer as the shared summary reads it.
export function toSharedResult(row: ItemResult): SharedItemResult {
  const result: SharedItemResult = {
    itemKey: row.itemKey,
    answer: row.answer,
    answeredAt: row.answeredAt.toISOString(),
  };
  if (row.measurementQuantity !== null && row.measurementValue !== null && row.measurementUnit !== null) {
    result.measurement = { quantity: row.measurementQuantity, value: row.measurementValue, unit: row.measurementUnit };
  }
  if (row.verdict !== null) result.verdict = row.verdict;
  if (row.noReading !== null) result.noReading = row.noReading;
  if (row.fixed !== null) result.fixed = row.fixed;
  if (row.detail !== null) result.detail = row.detail;
  if (row.heard !== null) result.heard = row.heard;
  if (row.confidence !== null) result.confidence = row.confidence;
  return result;
}

export function toSignatureResponse(signature: Signature, signerName: string): SignatureResponse {
  return {
    id: signature.id,
    role: signature.role,
    signer: { id: signature.signerId, name: signerName },
    name: signature.name,
    statement: signature.statement,
    signedAt: signature.signedAt.toISOString(),
    hasDrawing: signature.drawing !== null && signature.drawing !== '',
  };
}
