export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  demoAccounts: () => [...authKeys.all, 'demo-accounts'] as const,
};
