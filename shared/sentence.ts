/**
 * Ends a sentence with a full stop unless it already ends with one (a name such as "Paper & Co."
 * or "Ann Lee Jr.", a question, an exclamation), so a name at the end never gets two.
 */
export function endSentence(text: string): string {
  const t = text.trimEnd();
  return /[.!?…]["”’)]*$/.test(t) ? t : `${t}.`;
}
