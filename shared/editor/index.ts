/** The write-up's document model: schema, validation and renderers, shared by client and server. */
export * from './types';
export { isSafeImageSrc, isSafeLinkHref, isSafeVideoUrl } from './urls';
export { ArticleDocument, editorExtensions, getEditorSchema, HEADING_LEVELS, withNodeViews } from './extensions';
export { Step, StepTitle, STEP_BODY } from './step';
export { Still } from './still';
export { CutList, SupplyList } from './live-lists';
export { Caution, Tip, CALLOUT_CONTENT } from './callouts';
export { validateDoc, type ValidateOptions, type ValidateResult } from './validate-doc';
export { escapeHtml, renderDocHtml } from './render-html';
export { docToMarkdown, markdownToDoc } from './markdown';
export { DEFAULT_DISCLOSURE, formatMmNumber, plainText } from './render-parts';
