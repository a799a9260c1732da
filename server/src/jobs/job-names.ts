// Queue names, one home so senders need not depend on the module that works them.
export const JOB_SAFETY_DEFECT_REPORTED = 'safety-defect-reported';
export const JOB_SEND_MAIL = 'send-mail';
export const JOB_RETENTION_PURGE = 'retention-purge';

export interface SafetyDefectReportedJob {
  organizationId: string;
  inspectionId: string;
}
