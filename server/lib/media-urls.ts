/**
 * Addresses of files the media router serves (server/routes/media). Built here only, so the
 * presenters, the draft, the print view and the public page agree with the router.
 */

/** A still's full-size JPEG. */
export const stillUrl = (stillId: string) => `/media/stills/${stillId}.jpg`;

/** Where a recording's preview, poster and thumbnail sheets live. */
export const recordingMediaBase = (recordingId: string) => `/media/recordings/${recordingId}`;

/** The folder of a tutorial's resized blog images (with a trailing slash); `origin` makes it absolute. */
export const blogImageBase = (tutorialId: string, origin = '') => `${origin}/media/blog/${tutorialId}/`;
