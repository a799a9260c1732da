// One key factory for the walk-arounds on this device (its store) and the start data kept for them.
// Server reports and a unit's pending review are lib/api's (inspectionKeys, vehicleKeys).
export const walkaroundKeys = {
  all: ['walkaround'] as const,
  locals: () => [...walkaroundKeys.all, 'local'] as const,
  local: (clientId: string) => [...walkaroundKeys.locals(), clientId] as const,
  // Every walk-around on this device with what waits to be sent (the driver home).
  localLists: () => [...walkaroundKeys.locals(), 'list'] as const,
  // Units, acknowledgements and required readings kept for a start with no signal.
  startData: () => [...walkaroundKeys.all, 'start-data'] as const,
};
