export const sessionKeys = {
  all: ['session'] as const,
  current: () => [...sessionKeys.all, 'current'] as const,
  invitation: (token: string) => [...sessionKeys.all, 'invitation', token] as const,
};
