import type {
  CreateInspectionRequest,
  InspectionResponse,
  PhotoResponse,
  PutResultsRequest,
  PutResultsResponse,
  VoiceNoteResponse,
} from '@yardcall/shared';
import { api } from '../api-client';

// The four calls the sync engine makes; tests and other transports can stand in.
export interface SyncTransport {
  createInspection(body: CreateInspectionRequest): Promise<Pick<InspectionResponse, 'id'>>;
  putResults(inspectionId: string, body: PutResultsRequest): Promise<PutResultsResponse>;
  uploadNote(inspectionId: string, form: FormData): Promise<Pick<VoiceNoteResponse, 'id'>>;
  uploadPhoto(inspectionId: string, form: FormData): Promise<Pick<PhotoResponse, 'id'>>;
}

// A background sync must not throw the driver out of a walk-around on a lost session: it stops
// with the server's sentence and the app decides when to ask for a sign-in.
const background = { skipUnauthorizedHandler: true } as const;

const inspectionPath = (inspectionId: string) => `/inspections/${encodeURIComponent(inspectionId)}`;

export const apiSyncTransport: SyncTransport = {
  createInspection: (body) => api.post<InspectionResponse>('/inspections', body, background),
  putResults: (inspectionId, body) =>
    api.put<PutResultsResponse>(`${inspectionPath(inspectionId)}/results`, body, background),
  uploadNote: (inspectionId, form) =>
    api.post<VoiceNoteResponse>(`${inspectionPath(inspectionId)}/notes`, form, background),
  uploadPhoto: (inspectionId, form) =>
    api.post<PhotoResponse>(`${inspectionPath(inspectionId)}/photos`, form, background),
};
