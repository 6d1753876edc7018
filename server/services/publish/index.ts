/**
 * Publish renderers: the blog page and its zip (P1), the handout (P2), the cutting template
 * (P3) and the video description (P4). Pure rendering from a PublishBundle; no database.
 */
export type { Paper, PublishBundle, PublishChapter, PublishStill, PublishSupply, PublishTutorial } from './types';
export { templateLayout, templatePdf, templateSvg, type TemplateLayer, type TemplateLayout, type TemplateOmission, type TemplateOptions, type TemplatePage, type TemplateShape } from './template';
export { handoutPdf, type HandoutOptions } from './handout';
export { chapterLines, videoDescription } from './description';
export { blogHtml, blogZip, isoDuration, type BlogOptions, type BlogResult } from './blog';
export { BLOG_QUALITY, BLOG_WIDTHS, renderBlogImage, writeBlogImages, type BlogImage, type ImageVariant } from './images';
export { detectHazards, safetyNotes, type Hazard } from './safety';
export { inchText, paperSize, pieceSizeText, scoreLineText, type PaperSize, type PieceSizeText } from './sizes';
