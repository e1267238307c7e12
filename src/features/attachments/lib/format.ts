const units = ['bytes', 'KB', 'MB', 'GB'];

/** 1536 → "1.5 KB" (binary multiples, as file managers show them). */
export function formatSize(bytes: number): string {
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit++;
  }
  return unit === 0 ? `${bytes} bytes` : `${value.toFixed(value < 10 ? 1 : 0)} ${units[unit]}`;
}

/** A short label for the kind of file, from the detected media type. */
export function kindOf(mediaType: string): string {
  if (mediaType === 'chemical/x-jcamp-dx') return 'JCAMP-DX';
  if (mediaType === 'text/csv') return 'CSV';
  if (mediaType === 'text/tab-separated-values') return 'TSV';
  if (mediaType === 'application/pdf') return 'PDF';
  if (mediaType.startsWith('image/')) return mediaType.slice(6).toUpperCase();
  if (mediaType.startsWith('text/')) return 'Text';
  const sub = mediaType.split('/')[1] ?? 'file';
  return sub.length <= 8 ? sub.toUpperCase() : 'File';
}
