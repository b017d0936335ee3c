// Query keys of onboarding (the first-run checklist), and the literal prefixes of other features'
// keys that a fleet import changes (a feature never imports another).
export const onboardingKeys = {
  all: ['onboarding'] as const,
  checklist: (orgId: string) => [...onboardingKeys.all, 'checklist', orgId] as const,
};

export const foreignKeys = {
  machines: ['machines'] as const,
  due: ['due'] as const,
  latestReadings: ['readings'] as const,
};
