// One key factory for the organisation's own settings.
export const organizationKeys = {
  all: ['organization'] as const,
  retention: () => [...organizationKeys.all, 'retention'] as const,
  current: () => [...organizationKeys.all, 'current'] as const,
  timeZone: () => [...organizationKeys.all, 'time-zone'] as const,
};
