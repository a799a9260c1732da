import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

// The signed report as a PDF (the token guards it, so it comes as a Blob).
export function getReportPdf(inspectionId: string): Promise<Blob> {
  return api.getBlob(`/inspections/${encodeURIComponent(inspectionId)}/report.pdf`, { accept: 'application/pdf' });
}

export function useReportPdf() {
  return useMutation({ mutationFn: getReportPdf });
}
