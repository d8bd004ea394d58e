const ENTITIES: Record<string, string> = {'&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;'};

/**
 * Text made safe for HTML element content and quoted attribute values: `& < > " '` become
 * character references. Why: pack titles, series labels and folder names come from users.
 * Complexity: O(length).
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c]);
}
