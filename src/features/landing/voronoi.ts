/**
 * A small Voronoi tessellation by half-plane clipping, used to draw the
 * decorative "etched grains" on the landing page. O(n²) in the number of
 * sites, which is fine for the few dozen grains drawn.
 */
export type Point = readonly [number, number];

/** Keep the part of a convex polygon where (b - a)·p <= (|b|² - |a|²) / 2, i.e. closer to a than to b. */
function clipToSite(polygon: Point[], a: Point, b: Point): Point[] {
  const nx = b[0] - a[0];
  const ny = b[1] - a[1];
  const limit = (b[0] * b[0] + b[1] * b[1] - a[0] * a[0] - a[1] * a[1]) / 2;
  const side = (p: Point) => nx * p[0] + ny * p[1] - limit;
  const out: Point[] = [];
  for (let i = 0; i < polygon.length; i++) {
    const current = polygon[i];
    const next = polygon[(i + 1) % polygon.length];
    const sc = side(current);
    const sn = side(next);
    if (sc <= 0) out.push(current);
    if ((sc < 0 && sn > 0) || (sc > 0 && sn < 0)) {
      const t = sc / (sc - sn);
      out.push([current[0] + t * (next[0] - current[0]), current[1] + t * (next[1] - current[1])]);
    }
  }
  return out;
}

export function voronoiCells(sites: readonly Point[], width: number, height: number): Point[][] {
  return sites.map((site, i) => {
    let cell: Point[] = [
      [0, 0],
      [width, 0],
      [width, height],
      [0, height],
    ];
    for (let j = 0; j < sites.length && cell.length > 0; j++) {
      if (j !== i) cell = clipToSite(cell, site, sites[j]);
    }
    return cell;
  });
}

export function centroid(polygon: readonly Point[]): Point {
  let area = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < polygon.length; i++) {
    const [x0, y0] = polygon[i];
    const [x1, y1] = polygon[(i + 1) % polygon.length];
    const cross = x0 * y1 - x1 * y0;
    area += cross;
    cx += (x0 + x1) * cross;
    cy += (y0 + y1) * cross;
  }
  if (area === 0) return polygon[0] ?? [0, 0];
  return [cx / (3 * area), cy / (3 * area)];
}

/** Lloyd relaxation: move each site to its cell's centroid, giving even, grain-like cells. */
export function relaxedCells(sites: readonly Point[], width: number, height: number, iterations: number): Point[][] {
  let current = sites;
  for (let k = 0; k < iterations; k++) {
    current = voronoiCells(current, width, height).map((cell) => centroid(cell));
  }
  return voronoiCells(current, width, height);
}

/** A tiny seeded generator (mulberry32) so the picture is the same on every visit. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
