// One key factory for the walk-around: local (this device's store) and server data.
export const walkaroundKeys = {
  all: ['walkaround'] as const,
  locals: () => [...walkaroundKeys.all, 'local'] as const,
  local: (clientId: string) => [...walkaroundKeys.locals(), clientId] as const,
  // Every walk-around on this device with what waits to be sent (the driver home).
  localLists: () => [...walkaroundKeys.locals(), 'list'] as const,
  // Units, acknowledgements and required readings kept for a start with no signal.
  startData: () => [...walkaroundKeys.all, 'start-data'] as const,
  details: () => [...walkaroundKeys.all, 'detail'] as const,
  detail: (inspectionId: string) => [...walkaroundKeys.details(), inspectionId] as const,
  pendingAcknowledgements: () => [...walkaroundKeys.all, 'pending-acknowledgement'] as const,
  pendingAcknowledgement: (vehicleId: string) => [...walkaroundKeys.pendingAcknowledgements(), vehicleId] as const,
};
