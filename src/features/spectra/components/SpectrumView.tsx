import { useSpectrum } from '../api/queries';
import { SpectrumPlot } from './SpectrumPlot';

/** Loads a stored spectrum's full data and plots it. */
export function SpectrumView({ attachmentId }: { attachmentId: string }) {
  const spectrum = useSpectrum(attachmentId);
  if (spectrum.isPending) return <p className="text-sm text-ink-soft">Loading the spectrum…</p>;
  if (spectrum.isError) return <p className="text-sm text-ember-700">{spectrum.error.message}</p>;
  return <SpectrumPlot spectrum={spectrum.data} />;
}
