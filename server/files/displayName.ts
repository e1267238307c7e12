/**
 * Names as users send them can carry paths, control characters, bidirectional overrides (which
 * make "gpj.exe" read as "exe.jpg") and characters that break file systems or headers. The
 * display name keeps what a person would recognise and drops the rest; it is never a storage key.
 */
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/g;
const BIDI_AND_INVISIBLE = /[\u200b-\u200f\u202a-\u202e\u2066-\u2069\ufeff]/g;
const RESERVED = /[<>:"/\\|?*]/g;
const MAX_LENGTH = 180;

export function displayNameFor(originalName: string): string {
  const base = originalName.normalize('NFC').split(/[/\\]/).pop() ?? '';
  let name = base
    .replace(CONTROL, '')
    .replace(BIDI_AND_INVISIBLE, '')
    .replace(RESERVED, '_')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.\s]+|[.\s]+$/g, '');
  if (name.length > MAX_LENGTH) {
    const dot = name.lastIndexOf('.');
    const extension = dot > 0 && name.length - dot <= 12 ? name.slice(dot) : '';
    name = name.slice(0, MAX_LENGTH - extension.length) + extension;
  }
  return name || 'file';
}

/** The name as sent, kept for the record; PostgreSQL text cannot hold NUL and very long names help nobody. */
export function recordedOriginalName(originalName: string): string {
  return originalName.replace(/\u0000/g, '').slice(0, 1000);
}
