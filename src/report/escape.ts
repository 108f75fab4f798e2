// Text from the case file goes into HTML and SVG only through this function:
// a case cannot add markup or script to a report.

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** `text` safe inside XML/HTML element content and inside quoted attribute values. */
export function escapeMarkup(text: string): string {
  return text.replace(/[&<>"']/g, (character) => ENTITIES[character]);
}
