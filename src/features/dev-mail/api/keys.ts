export const devMailKeys = {
  all: ['dev-mail'] as const,
  lists: () => [...devMailKeys.all, 'list'] as const,
};
