import { describe, expect, it } from 'vitest';
import { previewOf } from '../../../server/files/spectrum/preview';

// Thinning a long trace for a thumbnail while keeping each bucket's highest and lowest point (so
// narrow peaks survive) is common practice, no source.
describe('thumbnail preview', () => {
  it('keeps short spectra whole', () => {
    expect(previewOf({ x: [1, 2, 3], y: [5, 6, 7] })).toEqual({ x: [1, 2, 3], y: [5, 6, 7] });
  });

  it('shrinks a long spectrum but keeps a one-point-wide peak and the deepest dip', () => {
    const n = 20_000;
    const x = Array.from({ length: n }, (_, i) => i);
    const y = x.map((i) => (i === 12_345 ? 100 : i === 777 ? -50 : Math.sin(i / 500)));
    const preview = previewOf({ x, y }, 100);
    expect(preview.x.length).toBeLessThanOrEqual(200);
    expect(Math.max(...preview.y)).toBe(100);
    expect(Math.min(...preview.y)).toBe(-50);
    expect(preview.x[preview.y.indexOf(100)]).toBe(12_345);
    // Still in rising x order, for the plot and the thumbnail alike.
    expect(preview.x.every((v, i) => i === 0 || preview.x[i - 1] < v)).toBe(true);
  });
});
