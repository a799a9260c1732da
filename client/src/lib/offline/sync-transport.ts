import type {
  CreateInspectionRequest,
  InspectionResponse,
  PhotoResponse,
  PutResultsRequest,
  PutResultsResponse,
  SubmitInspectionRequest,
  VoiceNoteResponse,
} from '@yardcall/shared';
import { api } from '../api-client';

// The calls the sync engine makes; tests and other transports can stand in.
export interface SyncTransport {
  createInspection(body: CreateInspectionRequest): Promise<Pick<InspectionResponse, 'id'>>;
  putResults(inspectionId: string, body: PutResultsRequest): Promise<PutResultsResponse>;
  uploadNote(inspectionId: string, form: FormData): Promise<Pick<VoiceNoteResponse, 'id'>>;
  uploadPhoto(inspectionId: string, form: FormData): Promise<Pick<PhotoResponse, 'id'>>;
  submitInspection(
    inspectionId: string,
    body: SubmitInspectionRequest,
  ): Promise<Pick<InspectionResponse, 'submittedAt'>>;
  getInspection(inspectionId: string): Promise<Pick<InspectionResponse, 'status' | 'submittedAt'>>;
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
  submitInspection: (inspectionId, body) =>
    api.post<InspectionResponse>(`${inspectionPath(inspectionId)}/submit`, body, background),
  getInspection: (inspectionId) => api.get<InspectionResponse>(inspectionPath(inspectionId), background),
};
