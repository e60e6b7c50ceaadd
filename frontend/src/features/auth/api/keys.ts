export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  /** Client-only marker: the session ended because the person signed out, not because it expired. */
  signedOut: () => [...authKeys.all, 'signed-out'] as const,
  invitationPreviews: () => [...authKeys.all, 'invitation-preview'] as const,
  invitationPreview: (token: string) => [...authKeys.invitationPreviews(), token] as const,
};
