/** Query keys of classes: a studio's list, one class (with its roster), its kit plan, the public page, an attendee's link, "your classes". */
export const classKeys = {
  all: ['classes'] as const,
  studio: (studioId: string) => [...classKeys.all, 'studio', studioId] as const,
  detail: (id: string) => [...classKeys.all, 'detail', id] as const,
  kitPlan: (id: string) => [...classKeys.all, 'detail', id, 'kit-plan'] as const,
  public: (studioSlug: string, id: string) => [...classKeys.all, 'public', studioSlug, id] as const,
  registration: (id: string) => [...classKeys.all, 'registration', id] as const,
  mine: () => [...classKeys.all, 'mine'] as const,
};
