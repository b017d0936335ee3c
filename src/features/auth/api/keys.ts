// Query keys of the signed-out flows (the session itself lives in lib/auth.tsx: sessionKeys).
export const authKeys = {
  all: ['auth'] as const,
  invitations: () => [...authKeys.all, 'invitation'] as const,
  invitation: (token: string) => [...authKeys.invitations(), token] as const,
  signUpStatus: () => [...authKeys.all, 'sign-up-status'] as const,
};
