import { useId, useMemo } from "react";
import { relaxedCells, seededRandom, type Point } from "./voronoi";

const SIZE = 400;
const GRAIN_COUNT = 34;
const CARBIDE_COUNT = 150;
// Etched prior-austenite grains read as slightly different greys under the lens.
const GRAIN_TONES = ["#3a342e", "#433c35", "#2f2a25", "#4d453d", "#37312b", "#514840"];

interface Carbide {
  x: number;
  y: number;
  rx: number;
  ry: number;
  angle: number;
}

function buildField() {
  const random = seededRandom(1095);
  const sites: Point[] = Array.from({ length: GRAIN_COUNT }, () => [random() * SIZE, random() * SIZE] as const);
  const cells = relaxedCells(sites, SIZE, SIZE, 2);
  const carbides: Carbide[] = Array.from({ length: CARBIDE_COUNT }, () => {
    const r = 1.2 + random() ** 3 * 4.2;
    return { x: random() * SIZE, y: random() * SIZE, rx: r, ry: r * (0.6 + random() * 0.4), angle: random() * 180 };
  });
  return { cells, carbides, tones: cells.map(() => GRAIN_TONES[Math.floor(random() * GRAIN_TONES.length)]) };
}

/** A decorative eyepiece view of an etched, hardened blade steel: grains, carbides and a reticle. */
export function Micrograph({ className }: { className?: string }) {
  const id = useId().replace(/:/g, "");
  const { cells, carbides, tones } = useMemo(buildField, []);
  const clip = `${id}-lens`;
  const glow = `${id}-glow`;
  const vignette = `${id}-vignette`;

  return (
    <svg viewBox={`0 0 ${SIZE} ${SIZE}`} className={className} aria-hidden="true" focusable="false">
      <defs>
        <clipPath id={clip}>
          <circle cx={SIZE / 2} cy={SIZE / 2} r={SIZE / 2 - 6} />
        </clipPath>
        <radialGradient id={glow} cx="0.72" cy="0.86" r="0.75">
          <stop offset="0" stopColor="#ff8c42" stopOpacity="0.55" />
          <stop offset="0.45" stopColor="#f26d1d" stopOpacity="0.12" />
          <stop offset="1" stopColor="#f26d1d" stopOpacity="0" />
        </radialGradient>
        <radialGradient id={vignette} cx="0.5" cy="0.5" r="0.5">
          <stop offset="0.7" stopColor="#0f0d0b" stopOpacity="0" />
          <stop offset="1" stopColor="#0f0d0b" stopOpacity="0.85" />
        </radialGradient>
      </defs>

      <g clipPath={`url(#${clip})`}>
        {cells.map((cell, i) => (
          <polygon
            key={i}
            points={cell.map(([x, y]) => `${x.toFixed(1)},${y.toFixed(1)}`).join(" ")}
            fill={tones[i]}
            stroke="#14110f"
            strokeWidth="2.2"
            strokeLinejoin="round"
          />
        ))}
        {carbides.map((c, i) => (
          <ellipse
            key={i}
            cx={c.x}
            cy={c.y}
            rx={c.rx}
            ry={c.ry}
            transform={`rotate(${c.angle.toFixed(0)} ${c.x.toFixed(1)} ${c.y.toFixed(1)})`}
            fill="#ebe3d5"
            fillOpacity={0.55 + (c.rx / 6) * 0.4}
          />
        ))}
        <rect width={SIZE} height={SIZE} fill={`url(#${glow})`} />
        <rect width={SIZE} height={SIZE} fill={`url(#${vignette})`} />

        {/* Reticle: crosshair, ticks and a scale bar, as in a measuring eyepiece. */}
        <g stroke="#97bfd9" strokeOpacity="0.7" strokeWidth="1">
          <line x1={SIZE / 2} y1={24} x2={SIZE / 2} y2={SIZE - 24} />
          <line x1={24} y1={SIZE / 2} x2={SIZE - 24} y2={SIZE / 2} />
          {Array.from({ length: 17 }, (_, k) => {
            const x = 40 + k * 20;
            const long = k % 4 === 0;
            return <line key={k} x1={x} y1={SIZE / 2 - (long ? 8 : 4)} x2={x} y2={SIZE / 2 + (long ? 8 : 4)} />;
          })}
        </g>
        <g>
          <rect x={238} y={322} width={80} height={4} fill="#fcfaf6" />
          <text x={278} y={314} textAnchor="middle" fill="#fcfaf6" fontSize="13" fontFamily="JetBrains Mono Variable, monospace">
            20 µm
          </text>
        </g>
      </g>
      <circle cx={SIZE / 2} cy={SIZE / 2} r={SIZE / 2 - 6} fill="none" stroke="#6b625a" strokeWidth="6" />
      <circle cx={SIZE / 2} cy={SIZE / 2} r={SIZE / 2 - 2} fill="none" stroke="#c4bbb0" strokeWidth="1.5" strokeOpacity="0.6" />
    </svg>
  );
}
