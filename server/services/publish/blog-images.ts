import { renderBlogImage, type BlogImage } from './images';
import { storage } from '../storage';

/** Where the resized copies of a tutorial's stills for "copy HTML" are kept. */
export const blogImageKey = (tutorialId: string, name: string) => `blog/${tutorialId}/${name}`;

/**
 * Makes (once) the resized files a blog page refers to, so HTML pasted into a blog loads its
 * images from this server. Files are named by still id and size, so a new still gets a new name.
 */
export async function ensureBlogImages(tutorialId: string, images: readonly BlogImage[]): Promise<void> {
  for (const image of images) {
    const missing = [];
    for (const v of image.srcset) if (!(await storage.exists(blogImageKey(tutorialId, v.name)))) missing.push(v.name);
    if (missing.length === 0) continue;
    for (const v of await renderBlogImage(image)) await storage.put(blogImageKey(tutorialId, v.name), v.data, 'image/jpeg');
  }
}
