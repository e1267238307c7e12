import type { SpectrumPreview, SpectrumSummary } from '../../../../shared/schemas';

const WIDTH = 80;
const HEIGHT = 56;

/** A tiny line drawing of the preview points, drawn in the same direction as the full plot. */
export function SpectrumThumbnail({ spectrum }: { spectrum: SpectrumSummary & { preview: SpectrumPreview } }) {
  const { x, y } = spectrum.preview;
  const [xMin, xMax] = [Math.min(...x), Math.max(...x)];
  const [yMin, yMax] = [Math.min(...y), Math.max(...y)];
  const sx = (v: number) => {
    const t = (v - xMin) / (xMax - xMin || 1);
    return (spectrum.reverseX ? 1 - t : t) * (WIDTH - 4) + 2;
  };
  const sy = (v: number) => HEIGHT - 3 - ((v - yMin) / (yMax - yMin || 1)) * (HEIGHT - 6);
  const points = x.map((v, i) => `${sx(v).toFixed(1)},${sy(y[i]).toFixed(1)}`).join(' ');
  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-full w-full" role="img" aria-label={`Thumbnail of ${spectrum.title || 'the spectrum'}`} data-testid="spectrum-thumbnail">
      <polyline points={points} fill="none" stroke="#275e52" strokeWidth={1} strokeLinejoin="round" vectorEffect="non-scaling-stroke" />
    </svg>
  );
}
