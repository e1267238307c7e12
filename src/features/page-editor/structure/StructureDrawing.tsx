import { useEffect, useId, useMemo, useState } from 'react';
import type { Explanation } from '../../../../shared/chem';
import { depictMolfile } from './chemistry';
import { atomPositions, centreOf, locantPosition } from './depictionGeometry';

const WIDTH = 320;
const HEIGHT = 220;

/**
 * The openchemlib depiction of a molfile. With an explanation, the parent chain or ring is
 * ringed in reed with its locants written beside each atom, and substituent atoms are tinted.
 */
export function StructureDrawing({ molfile, explanation, label }: { molfile: string; explanation: Explanation | null; label: string }) {
  const svgId = `depiction-${useId().replace(/[^a-zA-Z0-9]/g, '')}`;
  const [svg, setSvg] = useState<string | null>(null);
  const [failed, setFailed] = useState(false);

  useEffect(() => {
    let current = true;
    setFailed(false);
    depictMolfile(molfile, svgId, WIDTH, HEIGHT).then(
      (drawn) => current && setSvg(drawn),
      () => current && setFailed(true),
    );
    return () => {
      current = false;
    };
  }, [molfile, svgId]);

  const positions = useMemo(() => (svg ? atomPositions(svg, svgId) : new Map()), [svg, svgId]);

  if (failed) return <p className="text-sm text-ember-700">The drawing could not be made from this molfile.</p>;
  if (!svg) return <div className="h-[220px] w-[320px] animate-pulse rounded bg-paper-deep" aria-label="Drawing the structure" />;

  const parentAtoms = explanation?.parent.atoms ?? [];
  const centre = centreOf(parentAtoms.map((atom) => positions.get(atom)).filter((point) => point !== undefined));
  const substituentAtoms = new Set(explanation?.substituents.flatMap((substituent) => substituent.atoms) ?? []);

  return (
    <div className="relative h-[220px] w-[320px] shrink-0" role="img" aria-label={`Drawing of ${label || 'the structure'}`}>
      {/* The SVG comes from openchemlib's depictor for our own molfile, never from user HTML. */}
      <div className="absolute inset-0" dangerouslySetInnerHTML={{ __html: svg }} />
      {explanation && (
        <svg className="pointer-events-none absolute inset-0" viewBox={`0 0 ${WIDTH} ${HEIGHT}`} data-testid="name-highlight">
          {[...substituentAtoms].map((atom) => {
            const point = positions.get(atom);
            return point && <circle key={`s${atom}`} cx={point.x} cy={point.y} r={9} fill="#4a6f8f" fillOpacity={0.18} />;
          })}
          {parentAtoms.map((atom, i) => {
            const point = positions.get(atom);
            if (!point) return null;
            const at = locantPosition(point, centre);
            return (
              <g key={`p${atom}`}>
                <circle cx={point.x} cy={point.y} r={9} fill="#e9c46a" fillOpacity={0.45} stroke="#c9952c" strokeWidth={1} />
                <text x={at.x} y={at.y + 4} textAnchor="middle" fontSize={11} fontWeight={600} fill="#7d5a12">
                  {i + 1}
                </text>
              </g>
            );
          })}
        </svg>
      )}
    </div>
  );
}
