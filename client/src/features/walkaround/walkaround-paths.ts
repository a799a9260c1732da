// Where a walk-around's screens live; the server serves the light run page at the run path too.
export function runPath(clientId: string): string {
  return `/driver/inspections/${encodeURIComponent(clientId)}`;
}

export function finishPath(clientId: string): string {
  return `${runPath(clientId)}/finish`;
}
