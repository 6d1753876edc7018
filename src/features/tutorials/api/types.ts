import type { TutorialState } from '@shared/schemas/tutorial';

export type TutorialAbilities = {
  read: boolean;
  update: boolean;
  delete: boolean;
  submit: boolean;
  approve: boolean;
  sendBack: boolean;
  publish: boolean;
  unpublish: boolean;
  comment: boolean;
};

export type Tutorial = {
  id: string;
  studioId: string;
  authorId: string | null;
  author?: { id: string; name: string };
  title: string;
  slug: string;
  state: TutorialState;
  dueDate: string | null;
  precision: 8 | 16 | 32;
  defaultUnit: 'in' | 'mm' | 'cm';
  publishedAt: string | null;
  videoUrl: string | null;
  createdAt: string;
  updatedAt: string;
  abilities: TutorialAbilities;
};
