import type { Paper } from '@shared/schemas/publish';

/** Every export address of a tutorial, built in one place (the server's exports router owns them). */
export const exportUrls = {
  base: (id: string) => `/api/tutorials/${id}/export`,
  blogPage: (id: string) => `${exportUrls.base(id)}/html`,
  blogJson: (id: string) => `${exportUrls.base(id)}/html?format=json`,
  blogDownload: (id: string) => `${exportUrls.base(id)}/html?download=1`,
  zip: (id: string) => `${exportUrls.base(id)}/zip`,
  handoutPdf: (id: string, paper: Paper) => `${exportUrls.base(id)}/handout.pdf?paper=${paper}`,
  templatePdf: (id: string, paper: Paper) => `${exportUrls.base(id)}/template.pdf?paper=${paper}`,
  /** For api(), which adds /api itself: the template's page count as JSON. */
  templateInfo: (id: string, paper: Paper) => `/tutorials/${id}/export/template.json?paper=${paper}`,
  templateSvg: (id: string, paper: Paper, page = 1) => `${exportUrls.base(id)}/template.svg?paper=${paper}&page=${page}`,
  description: (id: string) => `${exportUrls.base(id)}/description.txt`,
  descriptionDownload: (id: string) => `${exportUrls.base(id)}/description.txt?download=1`,
  /** The server-rendered handout for the browser's print dialog; it works before publishing too. */
  printView: (id: string, paper: Paper) => `/print/${id}?paper=${paper}`,
  /** The stable public address of a published tutorial (server/services/publish-bundle.ts publicPath). */
  publicPage: (studioSlug: string, tutorialSlug: string) => `/t/${studioSlug}/${tutorialSlug}`,
};
