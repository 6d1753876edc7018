import { Fragment, Slice, type Node as PMNode } from '@tiptap/pm/model';
import { isSafeImageSrc } from '@shared/editor/urls';

/**
 * True for a photo address a paste may bring in: an absolute http(s) address, or our own
 * "/media/..." (copied from another write-up here). data:, blob: and file: images, and relative
 * paths that would resolve against this site, are refused before the schema even sees them.
 */
export function isPastableImageSrc(src: unknown): boolean {
  return isSafeImageSrc(src) && (/^https?:\/\//i.test(src) || src.startsWith('/media/'));
}

function clean(fragment: Fragment): Fragment {
  const kept: PMNode[] = [];
  let changed = false;
  fragment.forEach((node) => {
    if (node.type.name === 'still' && !isPastableImageSrc(node.attrs.src)) {
      changed = true;
      return;
    }
    const content = node.isLeaf ? node.content : clean(node.content);
    if (content !== node.content) changed = true;
    kept.push(content === node.content ? node : node.copy(content));
  });
  return changed ? Fragment.fromArray(kept) : fragment;
}

/**
 * Drops pasted photos whose address is not allowed (see isPastableImageSrc), wherever they sit
 * in the pasted content. A container left empty is dropped by ProseMirror's fitting, and the
 * server validates every document again anyway.
 */
export function dropUnpastableImages(slice: Slice): Slice {
  const content = clean(slice.content);
  return content === slice.content ? slice : new Slice(content, slice.openStart, slice.openEnd);
}

/** True when a paste or drop carries image files rather than text (they are not uploaded from here). */
export function carriesImageFiles(data: DataTransfer | null): boolean {
  if (!data) return false;
  return Array.from(data.files ?? []).some((f) => f.type.startsWith('image/'));
}
