/** Media work over files with the system ffmpeg: no database, no HTTP. */
export { MediaError } from './media-error';
export { probe } from './probe';
export { makePreview, makePoster } from './preview';
export { makeThumbnails } from './thumbnails';
export { grabFrame, grabSharpest } from './frames';
export { generateDemoVideo } from './demo-video';
