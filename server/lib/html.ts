/** Escapes text for HTML content and quoted attributes as numeric references (`<` → `&#60;`): mail, the development mailbox. */
export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
