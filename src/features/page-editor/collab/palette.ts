/**
 * Presence colours: our own marsh palette, dark enough for white caret labels and distinct side
 * by side. A person keeps the same colour on every page and in every session.
 */
export const presencePalette = ['#337565', '#b4482f', '#4a6f8f', '#c9952c', '#7a4f8f', '#2f7f8f', '#8f6a3a', '#5b7a2e'] as const;

export function presenceColour(userId: string): string {
  let hash = 0;
  for (const char of userId) hash = (hash * 31 + char.charCodeAt(0)) >>> 0;
  return presencePalette[hash % presencePalette.length];
}
