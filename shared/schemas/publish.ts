import { z } from 'zod';

/** Paper the handout and the template are printed on. */
export const PAPERS = ['letter', 'a4'] as const;
export type Paper = (typeof PAPERS)[number];
export const paperSchema = z.enum(PAPERS);

/**
 * ?version= of every export: `published` (the default) is what readers see, the published version
 * of a published tutorial; `draft` is the workspace's draft, for the people working on it (a
 * pending update's preview).
 */
export const EXPORT_VERSIONS = ['published', 'draft'] as const;
export type ExportVersion = (typeof EXPORT_VERSIONS)[number];
const versionField = z.enum(EXPORT_VERSIONS, 'Use version=published or version=draft').optional();
/** ?version= alone (the zip, the Markdown). */
export const versionQuery = z.object({ version: versionField });

/** ?paper= of the handout and template exports; Letter unless asked. */
export const paperQuery = z.object({ paper: paperSchema.default('letter'), version: versionField });
/** ?paper=&page= of the SVG template, one page at a time. */
export const svgTemplateQuery = paperQuery.extend({ page: z.coerce.number().int().min(1).default(1) });
/** The print view's ?paper=: anything unknown falls back to Letter rather than an error page. */
export const printViewQuery = z.object({ paper: paperSchema.catch('letter'), version: z.enum(EXPORT_VERSIONS).optional().catch(undefined) });
/** ?format=json (the blog export as JSON) and ?download=1 (as a file) of the text exports. */
export const textExportQuery = z.object({
  version: versionField,
  format: z
    .unknown()
    .optional()
    .transform((v) => (v === 'json' ? 'json' : 'page')),
  download: z
    .unknown()
    .optional()
    .transform((v) => Boolean(v)),
});

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/** GET /tutorials/:id/export/html?format=json: the article fragment, its words as plain text and the HowTo data. */
export type BlogExportDto = { html: string; text: string; jsonLd: Record<string, unknown> };

/** GET /tutorials/:id/export/template.json?paper=: the cutting template's page count, or why there is none. */
export type TemplateInfoDto = { kind: 'ready'; pageCount: number } | { kind: 'empty'; message: string };
