/**
 * openchemlib's SVG depiction marks every atom with an invisible `<circle id="<svgId>:Atom:<i>">`
 * at its drawn position. Reading those back lets us lay our own highlights and locants over the
 * drawing in the same coordinate system. Pure, so it is unit-tested.
 */
export interface Point {
  x: number;
  y: number;
}

export function atomPositions(svg: string, svgId: string): Map<number, Point> {
  const positions = new Map<number, Point>();
  const circle = /<circle\b[^>]*>/g;
  for (const match of svg.matchAll(circle)) {
    const tag = match[0];
    const id = /\bid="([^"]*)"/.exec(tag)?.[1];
    if (!id?.startsWith(`${svgId}:Atom:`)) continue;
    const index = Number(id.slice(svgId.length + ':Atom:'.length));
    const cx = Number(/\bcx="([^"]*)"/.exec(tag)?.[1]);
    const cy = Number(/\bcy="([^"]*)"/.exec(tag)?.[1]);
    if (Number.isInteger(index) && Number.isFinite(cx) && Number.isFinite(cy)) positions.set(index, { x: cx, y: cy });
  }
  return positions;
}

/** Where to write a locant: pushed outward from the drawing's centre so it clears the bonds. */
export function locantPosition(atom: Point, centre: Point, distance = 13): Point {
  const dx = atom.x - centre.x;
  const dy = atom.y - centre.y;
  const length = Math.hypot(dx, dy);
  if (length < 1e-6) return { x: atom.x, y: atom.y - distance };
  return { x: atom.x + (dx / length) * distance, y: atom.y + (dy / length) * distance };
}

export function centreOf(points: Iterable<Point>): Point {
  let x = 0;
  let y = 0;
  let n = 0;
  for (const point of points) {
    x += point.x;
    y += point.y;
    n += 1;
  }
  return n === 0 ? { x: 0, y: 0 } : { x: x / n, y: y / n };
}
