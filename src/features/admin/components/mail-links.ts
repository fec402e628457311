/** The web addresses in a message's text part, in order, each once. */
export function linksIn(text: string | null): string[] {
  if (!text) return [];
  const found = text.match(/https?:\/\/[^\s<>"'()[\]]+/g) ?? [];
  return [...new Set(found.map((url) => url.replace(/[.,;:!?]+$/, '')))];
}
