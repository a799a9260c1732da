import { Injectable } from '@nestjs/common';
import { ChecklistCache } from '../vehicles/vehicle-checklist';

// Checklists are rebuilt from the stored snapshot, which never changes: keep the recent ones.
const CHECKLIST_CACHE_MAX = 500;

// One cache for the module: a walk-around's checklist built at its start serves its answers and its submit.
@Injectable()
export class InspectionChecklists extends ChecklistCache {
  constructor() {
    super(CHECKLIST_CACHE_MAX);
  }
}
