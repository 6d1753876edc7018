export const studioKeys = {
  all: ['studios'] as const,
  detail: (id: string) => [...studioKeys.all, 'detail', id] as const,
  members: (id: string) => [...studioKeys.all, 'members', id] as const,
};
