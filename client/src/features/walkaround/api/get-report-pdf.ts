import { useMutation } from '@tanstack/react-query';
import { ApiError, NETWORK_ERROR_STATUS, buildApiUrl, tokenStore } from '@/lib/api-client';

export function reportPdfPath(inspectionId: string): string {
  return buildApiUrl(`/inspections/${encodeURIComponent(inspectionId)}/report.pdf`);
}

// The PDF needs the session's token, which a plain link cannot carry: fetched as a Blob.
export async function getReportPdf(inspectionId: string): Promise<Blob> {
  const token = tokenStore.get();
  let response: Response;
  try {
    response = await fetch(reportPdfPath(inspectionId), {
      headers: { Accept: 'application/pdf', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    });
  } catch {
    throw new ApiError(
      NETWORK_ERROR_STATUS,
      'Yardcall cannot be reached. Check the connection and try again.',
      'network',
    );
  }
  if (!response.ok) throw new ApiError(response.status, response.statusText || `Request failed (${response.status}).`);
  return response.blob();
}

export function useReportPdf() {
  return useMutation({ mutationFn: getReportPdf });
}
