import { ConflictException, NotFoundException } from '@nestjs/common';
import type { Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import type { Inspection } from './entities/inspection.entity';

export const SUBMITTED_MESSAGE =
  "This report is submitted and signed, so it can no longer be changed: changes now go through the mechanic's repair certification and the next driver's acknowledgement.";
export const INSPECTION_NOT_FOUND = 'No inspection with this id in your organisation.';

// Who may read an inspection: their organisation's, a driver's own, a trainer's practice ones. To anyone
// else, another organisation included, it does not exist (404).
export async function findReadableInspection(
  inspections: Repository<Inspection>,
  user: AuthUser,
  id: string,
): Promise<Inspection> {
  const inspection = await inspections.findOneBy({ id, organizationId: user.organizationId });
  if (
    !inspection ||
    (user.role === 'driver' && inspection.driverId !== user.id) ||
    (user.role === 'trainer' && inspection.kind !== 'practice')
  ) {
    throw new NotFoundException(INSPECTION_NOT_FOUND);
  }
  return inspection;
}

// The caller's own inspection (found by driver) while it is in progress: 404 when missing, 409 once submitted.
export function assertEditable(inspection: Inspection | null): Inspection {
  if (!inspection) throw new NotFoundException(INSPECTION_NOT_FOUND);
  if (inspection.status === 'submitted') throw new ConflictException(SUBMITTED_MESSAGE);
  return inspection;
}
