/** The write-up's document model: schema, validation and renderers, shared by client and server. */
export * from './types';
export { getEditorSchema } from './extensions';
export { validateDoc } from './validate-doc';
export { docToMarkdown, markdownToDoc } from './markdown';
export { plainText } from './render-parts';
