type ClipboardLike = Pick<Clipboard, 'writeText'> & Partial<Pick<Clipboard, 'write'>>;
type ItemCtor = new (items: Record<string, Blob>) => ClipboardItem;
export type ClipboardEnv = { clipboard?: ClipboardLike; ClipboardItem?: ItemCtor };

/** How the copy went: as formatted HTML with a plain-text twin, or as the HTML source in plain text. */
export type CopyResult = 'rich' | 'source';

/** The browser refused both ways of copying (no permission, not a secure page). */
export class CopyRefusedError extends Error {}

const browserEnv = (): ClipboardEnv => ({
  clipboard: typeof navigator === 'undefined' ? undefined : navigator.clipboard,
  ClipboardItem: typeof ClipboardItem === 'undefined' ? undefined : ClipboardItem,
});

/**
 * Copies an HTML fragment so a rich editor pastes it formatted and a plain one pastes its words;
 * where the browser cannot write HTML, copies the HTML source as text (what a blog's HTML view
 * wants). Throws CopyRefusedError when neither is allowed.
 */
export async function copyHtml(html: string, text: string, env: ClipboardEnv = browserEnv()): Promise<CopyResult> {
  const { clipboard, ClipboardItem: Item } = env;
  if (clipboard?.write && Item) {
    try {
      await clipboard.write([new Item({ 'text/html': new Blob([html], { type: 'text/html' }), 'text/plain': new Blob([text], { type: 'text/plain' }) })]);
      return 'rich';
    } catch {
      // Some browsers refuse rich items but allow text: try that below.
    }
  }
  await copyText(html, env);
  return 'source';
}

/** Copies plain text; throws CopyRefusedError when the browser does not allow it. */
export async function copyText(text: string, env: ClipboardEnv = browserEnv()): Promise<void> {
  if (!env.clipboard?.writeText) throw new CopyRefusedError('The browser has no clipboard access here');
  try {
    await env.clipboard.writeText(text);
  } catch (e) {
    throw new CopyRefusedError((e as Error).message || 'The browser did not allow copying');
  }
}
