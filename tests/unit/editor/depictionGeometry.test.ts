import { describe, expect, it } from 'vitest';
import { atomPositions, centreOf, locantPosition } from '../../../src/features/page-editor/structure/depictionGeometry';

// The markup is the shape openchemlib 9 writes (Molecule.toSVG): invisible event circles named
// "<svg id>:Atom:<index>", alongside bond lines named "<svg id>:Bond:<index>".
const svg = `<svg id="d1" viewBox="0 0 320 220">
  <line id="d1:Bond:0" class="event" x1="229.28" y1="100" x2="194.64" y2="80" stroke-width="8" opacity="0" />
  <circle id="d1:Atom:0" class="event" cx="229.28" cy="100" r="8" opacity="0" />
  <circle id="d1:Atom:1" class="event" cx="194.64" cy="80" r="8" opacity="0" />
  <circle id="d10:Atom:2" class="event" cx="1" cy="1" r="8" opacity="0" />
</svg>`;

describe('atomPositions', () => {
  it('reads each atom of this depiction and ignores bonds and other depictions', () => {
    const positions = atomPositions(svg, 'd1');
    expect([...positions.entries()]).toEqual([
      [0, { x: 229.28, y: 100 }],
      [1, { x: 194.64, y: 80 }],
    ]);
  });
});

describe('locant placement', () => {
  it('moves a locant away from the centre of the parent along the line through the atom', () => {
    const centre = centreOf([{ x: 0, y: 0 }, { x: 20, y: 0 }]);
    expect(centre).toEqual({ x: 10, y: 0 });
    expect(locantPosition({ x: 20, y: 0 }, centre, 5)).toEqual({ x: 25, y: 0 });
    // An atom at the centre (one-atom parent) gets its locant above it.
    expect(locantPosition({ x: 10, y: 0 }, centre, 5)).toEqual({ x: 10, y: -5 });
  });
});
