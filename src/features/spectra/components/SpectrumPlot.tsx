import { useEffect, useRef, useState } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { SpectrumData } from '../../../../shared/schemas';
import { axisLabel } from '../lib/axisLabel';

const HEIGHT = 300;
const AXIS_STYLE = { stroke: '#4d5b58', grid: { stroke: '#ece6d8', width: 1 }, ticks: { stroke: '#ddd6c6', width: 1 } };

/**
 * An interactive plot: drag across it to zoom into a range, "Whole spectrum" (or a double click)
 * to go back. NMR shift and IR wavenumber axes run from high to low, as chemists read them.
 */
export function SpectrumPlot({ spectrum }: { spectrum: SpectrumData }) {
  const box = useRef<HTMLDivElement>(null);
  const plot = useRef<uPlot | null>(null);
  const [zoomed, setZoomed] = useState(false);
  const { x, y } = spectrum.data;
  const full = { min: x[0], max: x[x.length - 1] };

  useEffect(() => {
    const element = box.current;
    if (!element) return;
    const xLabel = axisLabel(spectrum.x);
    const yLabel = axisLabel(spectrum.y);
    const created = new uPlot(
      {
        width: element.clientWidth || 600,
        height: HEIGHT,
        scales: { x: { time: false, dir: spectrum.reverseX ? -1 : 1 }, y: { auto: true } },
        axes: [
          { ...AXIS_STYLE, label: xLabel, labelSize: 22 },
          { ...AXIS_STYLE, label: yLabel, labelSize: 22, size: 64 },
        ],
        series: [{ label: xLabel }, { label: yLabel, stroke: '#275e52', width: 1.25, points: { show: false } }],
        cursor: { drag: { x: true, y: false, setScale: true } },
        legend: { show: true, live: true },
        hooks: {
          setScale: [
            (u, key) => {
              if (key !== 'x') return;
              const { min, max } = u.scales.x;
              setZoomed(min !== undefined && max !== undefined && (min > full.min || max < full.max));
            },
          ],
        },
      },
      [x, y],
      element,
    );
    plot.current = created;
    const resize = new ResizeObserver(() => created.setSize({ width: element.clientWidth, height: HEIGHT }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      created.destroy();
      plot.current = null;
    };
    // The data of a stored file never changes; rebuild only for another spectrum.
  }, [spectrum]);

  return (
    <figure className="space-y-2" data-testid="spectrum-plot">
      <figcaption className="flex flex-wrap items-baseline justify-between gap-2 text-sm">
        <span className="font-semibold text-ink">
          {spectrum.title || 'Spectrum'}
          {spectrum.dataType && <span className="ml-2 text-xs font-normal uppercase tracking-wide text-ink-faint">{spectrum.dataType}</span>}
          {spectrum.observeFrequencyMHz && (
            <span className="ml-2 text-xs font-normal text-ink-soft">
              {spectrum.nucleus ? `${spectrum.nucleus}, ` : ''}
              {spectrum.observeFrequencyMHz} MHz
            </span>
          )}
        </span>
        <span className="flex items-center gap-3 text-xs text-ink-soft">
          <span>{spectrum.points.toLocaleString('en-GB')} points · drag to zoom</span>
          <button
            type="button"
            className="rounded border border-fold-strong px-2 py-0.5 font-medium text-tide-700 hover:border-tide-400 disabled:opacity-50"
            disabled={!zoomed}
            onClick={() => plot.current?.setScale('x', full)}
          >
            Whole spectrum
          </button>
        </span>
      </figcaption>
      <div ref={box} className="w-full" role="img" aria-label={`Plot of ${axisLabel(spectrum.y)} against ${axisLabel(spectrum.x)}`} />
    </figure>
  );
}
