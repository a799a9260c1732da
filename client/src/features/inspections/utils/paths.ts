// Where a supervisor reads one inspection.
export function inspectionPath(id: string): string {
  return `/supervisor/inspections/${encodeURIComponent(id)}`;
}
