/** Media work over files with the system ffmpeg: no database, no HTTP. */
export { MediaError, type MediaErrorCode } from './media-error';
export { probe, type MediaInfo } from './probe';
export { makePreview, makePoster, PREVIEW_MAX_HEIGHT, PREVIEW_MAX_FPS, type PreviewOptions } from './preview';
export { makeThumbnails, type ThumbnailOptions, type ThumbnailSheets } from './thumbnails';
export { grabFrame, grabSharpest, type SharpestOptions, type SharpestStill } from './frames';
export { generateDemoVideo, DEMO_FONT, type DemoScene, type DemoVideoOptions } from './demo-video';
export { laplacianVariance } from './sharpness';
export { readJpegSize } from './jpeg-size';
