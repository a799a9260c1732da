import { Injectable } from '@nestjs/common';
import type { PhotoResponse, VoiceNoteResponse } from '@yardcall/shared';

export interface InspectionAttachments {
  notes: VoiceNoteResponse[];
  photos: PhotoResponse[];
}

// What a module that keeps voice notes or photos implements to have them shown with an inspection.
export interface InspectionAttachmentSource {
  attachmentsOf(inspectionId: string): Promise<Partial<InspectionAttachments>>;
}

// The seam for notes and photos: their module imports InspectionsModule and registers itself here
// (e.g. in onModuleInit), so inspections never depends on it. Without a source both lists are empty.
@Injectable()
export class InspectionAttachmentsRegistry {
  private readonly sources: InspectionAttachmentSource[] = [];

  register(source: InspectionAttachmentSource): void {
    this.sources.push(source);
  }

  async collect(inspectionId: string): Promise<InspectionAttachments> {
    const collected: InspectionAttachments = { notes: [], photos: [] };
    for (const part of await Promise.all(this.sources.map((s) => s.attachmentsOf(inspectionId)))) {
      collected.notes.push(...(part.notes ?? []));
      collected.photos.push(...(part.photos ?? []));
    }
    return collected;
  }
}
