/** Query keys of each person's e-mail choices, per studio. */
export const mailSettingsKeys = {
  all: ['mail-settings'] as const,
  studio: (studioId: string) => [...mailSettingsKeys.all, studioId] as const,
};
