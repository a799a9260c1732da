import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Checklist, PhotoResponse, VoiceNoteResponse } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import { Repository, type FindOptionsWhere } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import { Inspection } from '../inspections/entities/inspection.entity';
import { findReadableInspection } from '../inspections/inspection-access';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import type { PhotoUploadDto, VoiceNoteUploadDto } from './dto/upload.dto';
import { Photo } from './entities/photo.entity';
import { VoiceNote } from './entities/voice-note.entity';
import { checkUpload, type CheckedUpload } from '../uploads/check-upload';
import { PHOTO_MEDIA, VOICE_NOTE_MEDIA, type MediaKind } from '../uploads/media-types';
import type { ServedObject } from '../uploads/serve-object';

// The inspection an upload goes to, as the inspections module found it for the caller: with its
// checklist while in progress, `editable` null once submitted.
export interface AttachmentTarget {
  inspectionId: string;
  editable: { inspection: Inspection; checklist: Checklist } | null;
}

// An inspection's notes and photos, shown with it.
export interface InspectionAttachments {
  notes: VoiceNoteResponse[];
  photos: PhotoResponse[];
}

export interface UploadResult<T> {
  record: T;
  // False when the same clientId had already stored this upload.
  created: boolean;
}

type Prepared<T> =
  { existing: T } | { existing: null; inspection: Inspection; checklist: Checklist; checked: CheckedUpload };

interface StoredUpload {
  sha256: string;
  clientId: string;
}

// The columns every stored upload has; each kind adds its own when it creates the row.
interface UploadColumns {
  id: string;
  organizationId: string;
  inspectionId: string;
  itemKey: string;
  clientId: string;
  objectKey: string;
  mimeType: string;
  sizeBytes: number;
  sha256: string;
}

// What tells a voice note from a photo on the way in.
interface UploadKind<E extends StoredUpload, R> {
  kind: MediaKind<string>;
  folder: 'notes' | 'photos';
  uniqueIndex: string;
  repository: Repository<E>;
  // The record stored under this inspection and clientId.
  where: FindOptionsWhere<E>;
  create: (columns: UploadColumns) => E;
  toResponse: (record: E) => R;
}

export function toVoiceNoteResponse(note: VoiceNote): VoiceNoteResponse {
  return {
    id: note.id,
    clientId: note.clientId,
    itemKey: note.itemKey,
    heard: note.heard,
    durationMs: note.durationMs,
    mimeType: note.mimeType,
    sizeBytes: note.sizeBytes,
    sha256: note.sha256,
    createdAt: note.createdAt.toISOString(),
    audioUrl: `/api/notes/${note.id}/audio`,
  };
}

export function toPhotoResponse(photo: Photo): PhotoResponse {
  return {
    id: photo.id,
    clientId: photo.clientId,
    itemKey: photo.itemKey,
    mimeType: photo.mimeType,
    sizeBytes: photo.sizeBytes,
    createdAt: photo.createdAt.toISOString(),
    url: `/api/photos/${photo.id}`,
  };
}

// A clientId names one upload: sent again it answers the stored record, with other bytes it is a mistake.
function sameUpload<T extends StoredUpload>(existing: T, checked: CheckedUpload): T {
  if (existing.sha256 !== checked.sha256) {
    throw new ConflictException(
      `The client id ${existing.clientId} was already used for a different file: give each new upload its own client id.`,
    );
  }
  return existing;
}

function assertOnChecklist(checklist: Checklist, itemKey: string): void {
  if (!checklist.items.some((item) => item.key === itemKey)) {
    throw new ApiValidationException([
      { field: 'itemKey', message: `"${itemKey}" is not an item of this inspection's checklist.` },
    ]);
  }
}

const UNIQUE_NOTE = 'UQ_voice_notes_inspection_client';
const UNIQUE_PHOTO = 'UQ_photos_inspection_client';

// Voice notes and defect photos: checked by content, kept in ObjectStorage, idempotent on clientId.
@Injectable()
export class NotesService {
  constructor(
    @InjectRepository(VoiceNote) private readonly notes: Repository<VoiceNote>,
    @InjectRepository(Photo) private readonly photos: Repository<Photo>,
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  async addVoiceNote(
    target: AttachmentTarget,
    dto: VoiceNoteUploadDto,
    file: Express.Multer.File | undefined,
  ): Promise<UploadResult<VoiceNoteResponse>> {
    const { inspectionId } = target;
    return this.storeUpload(target, dto, file, {
      kind: VOICE_NOTE_MEDIA,
      folder: 'notes',
      uniqueIndex: UNIQUE_NOTE,
      repository: this.notes,
      where: { inspectionId, clientId: dto.clientId },
      create: (columns) =>
        this.notes.create({ ...columns, durationMs: dto.durationMs, heard: dto.heard?.trim() || null }),
      toResponse: toVoiceNoteResponse,
    });
  }

  async addPhoto(
    target: AttachmentTarget,
    dto: PhotoUploadDto,
    file: Express.Multer.File | undefined,
  ): Promise<UploadResult<PhotoResponse>> {
    const { inspectionId } = target;
    return this.storeUpload(target, dto, file, {
      kind: PHOTO_MEDIA,
      folder: 'photos',
      uniqueIndex: UNIQUE_PHOTO,
      repository: this.photos,
      where: { inspectionId, clientId: dto.clientId },
      create: (columns) => this.photos.create(columns),
      toResponse: toPhotoResponse,
    });
  }

  // Whoever may read the inspection may listen (findReadableInspection); to anyone else,
  // including another organisation, the note does not exist.
  async voiceNoteAudio(user: AuthUser, id: string): Promise<ServedObject> {
    const note = await this.notes.findOneBy({ id, organizationId: user.organizationId });
    const message = 'No voice note with this id in your organisation.';
    if (!note || !(await this.mayRead(user, note.inspectionId))) throw new NotFoundException(message);
    return { objectKey: note.objectKey, sizeBytes: note.sizeBytes, mimeType: note.mimeType, label: 'recording' };
  }

  async photoImage(user: AuthUser, id: string): Promise<ServedObject> {
    const photo = await this.photos.findOneBy({ id, organizationId: user.organizationId });
    const message = 'No photo with this id in your organisation.';
    if (!photo || !(await this.mayRead(user, photo.inspectionId))) throw new NotFoundException(message);
    return { objectKey: photo.objectKey, sizeBytes: photo.sizeBytes, mimeType: photo.mimeType, label: 'photo' };
  }

  // For GET /inspections/:id: the inspection's notes and photos in the order they were made. The
  // caller has already checked who may read the inspection.
  async attachmentsOf(inspectionId: string): Promise<InspectionAttachments> {
    const [notes, photos] = await Promise.all([
      this.notes.find({ where: { inspectionId }, order: { createdAt: 'ASC', id: 'ASC' } }),
      this.photos.find({ where: { inspectionId }, order: { createdAt: 'ASC', id: 'ASC' } }),
    ]);
    return { notes: notes.map(toVoiceNoteResponse), photos: photos.map(toPhotoResponse) };
  }

  // The steps every upload shares: the stored record for a retried clientId, else the file kept in
  // ObjectStorage under <folder>/<inspection>/<id> and its row saved.
  private async storeUpload<E extends StoredUpload, R>(
    target: AttachmentTarget,
    dto: { itemKey: string; clientId: string },
    file: Express.Multer.File | undefined,
    upload: UploadKind<E, R>,
  ): Promise<UploadResult<R>> {
    const { repository, where, toResponse } = upload;
    const prepared = await this.prepare(target, file, upload.kind, () => repository.findOneBy(where));
    if (!('checked' in prepared)) return { record: toResponse(prepared.existing), created: false };
    const { inspection, checklist, checked } = prepared;
    assertOnChecklist(checklist, dto.itemKey);

    const { inspectionId } = target;
    const id = randomUUID();
    const objectKey = `${upload.folder}/${inspectionId}/${id}.${checked.extension}`;
    await this.storage.put(objectKey, checked.buffer, { contentType: checked.mimeType });
    const record = upload.create({
      id,
      organizationId: inspection.organizationId,
      inspectionId,
      itemKey: dto.itemKey,
      clientId: dto.clientId,
      objectKey,
      mimeType: checked.mimeType,
      sizeBytes: checked.buffer.length,
      sha256: checked.sha256,
    });
    try {
      return { record: toResponse(await repository.save(record)), created: true };
    } catch (error) {
      // No row points at this copy's file: drop it, whatever went wrong.
      await this.storage.delete(objectKey);
      if (!isUniqueViolation(error, upload.uniqueIndex)) throw error;
      // The same upload raced in twice: the first one stands.
      const first = await repository.findOneByOrFail(where);
      return { record: toResponse(sameUpload(first, checked)), created: false };
    }
  }

  private async mayRead(user: AuthUser, inspectionId: string): Promise<boolean> {
    try {
      await findReadableInspection(this.inspections, user, inspectionId);
      return true;
    } catch (error) {
      if (error instanceof NotFoundException) return false;
      throw error;
    }
  }

  // The inspection in progress (the target) and the checked file. A record already stored under the
  // clientId is answered even after the inspection was submitted: the client may be retrying an upload
  // whose answer it lost.
  private async prepare<T extends StoredUpload>(
    target: AttachmentTarget,
    file: Express.Multer.File | undefined,
    kind: MediaKind<string>,
    findStored: () => Promise<T | null>,
  ): Promise<Prepared<T>> {
    const { editable } = target;
    if (!editable) {
      const stored = await findStored();
      if (!stored) {
        throw new ConflictException(`This inspection has been submitted: ${kind.label} can no longer be added to it.`);
      }
      return { existing: sameUpload(stored, await checkUpload(file, kind)) };
    }
    const checked = await checkUpload(file, kind);
    const stored = await findStored();
    if (stored) return { existing: sameUpload(stored, checked) };
    return { existing: null, ...editable, checked };
  }
}
