import type { SpectrumPreview } from '../../../shared/schemas/attachments';

/**
 * Shrinks a spectrum to about `buckets` × 2 points by keeping each bucket's lowest and highest
 * ordinate, so narrow peaks survive in a thumbnail (plain averaging would flatten them).
 */
export function previewOf(data: { x: number[]; y: number[] }, buckets = 160): SpectrumPreview {
  const n = data.x.length;
  if (n <= buckets * 2) return { x: [...data.x], y: [...data.y] };
  const x: number[] = [];
  const y: number[] = [];
  const size = n / buckets;
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor(b * size);
    const end = Math.min(n, Math.floor((b + 1) * size));
    let low = start;
    let high = start;
    for (let i = start; i < end; i++) {
      if (data.y[i] < data.y[low]) low = i;
      if (data.y[i] > data.y[high]) high = i;
    }
    for (const i of low <= high ? [low, high] : [high, low]) {
      if (x.length && x[x.length - 1] === data.x[i]) continue;
      x.push(data.x[i]);
      y.push(data.y[i]);
    }
  }
  return { x, y };
}
