import { useEffect, useImperativeHandle, useMemo, useRef, useState, type Ref } from "react";
import { Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import { createRandom, type CarbideType } from "@shared/metallurgy";
import type { BaseField, CarbideSimState, VisibleField } from "@shared/sim/carbides";
import { measured } from "@/lab/shared-ui/bench-marks";
import { carbideInfo } from "./carbide-info";
import { CARBIDE_STYLE, MATRIX_COLOUR } from "./palette";
import { patternTile } from "./patterns";
import { ScaleBar } from "./scale-bar";

export interface CanvasHandle {
  /** Redraw from the simulation state as it is now (called by the frame loop). */
  redraw: () => void;
}

interface FieldCanvasProps {
  ref?: Ref<CanvasHandle>;
  /** The live simulation state; read at draw time, so the frame loop can redraw without a React render. */
  sim: CarbideSimState;
  sizePx: number;
  label: string;
}

/**
 * The micrograph-like field: a static matrix layer (drawn once, cached) and one custom Shape that draws
 * every visible particle, grouped by type (one path, one fill, one pattern fill and one outline per type),
 * with periodic copies at the borders. Hover or tap names the particle under the pointer.
 */
export function FieldCanvas({ ref, sim, sizePx, label }: FieldCanvasProps) {
  const base = sim.base;
  const matrix = sim.params.state;
  const scale = sizePx / base.widthUm;
  const particleLayer = useRef<Konva.Layer>(null);
  const simRef = useRef(sim);
  simRef.current = sim;
  const [hover, setHover] = useState<{ x: number; y: number; type: CarbideType } | null>(null);

  // Draw synchronously (measured for the frame benchmark), not on Konva's next batch.
  const redraw = () => { measured("carbides:draw", () => { particleLayer.current?.draw(); }); };
  useImperativeHandle(ref, () => ({ redraw }));
  useEffect(() => { redraw(); }, [sim, sizePx]);

  const background = useMemo(() => matrixTexture(matrix, base.widthUm), [matrix, base.widthUm]);

  const find = (clientX: number, clientY: number, el: HTMLElement): { type: CarbideType; x: number; y: number } | null => {
    const rect = el.getBoundingClientRect();
    const xUm = ((clientX - rect.left) / rect.width) * base.widthUm;
    const yUm = ((clientY - rect.top) / rect.height) * base.heightUm;
    let best = -1;
    let bestGap = 0.4; // µm of slack, so small particles can be hit with a finger
    const visible = simRef.current.visible;
    for (let k = 0; k < visible.count; k++) {
      const i = visible.index[k];
      let dx = Math.abs(base.xUm[i] - xUm);
      let dy = Math.abs(base.yUm[i] - yUm);
      dx = Math.min(dx, base.widthUm - dx);
      dy = Math.min(dy, base.heightUm - dy);
      const gap = Math.hypot(dx, dy) - visible.radiusUm[k];
      if (gap < bestGap) { bestGap = gap; best = i; }
    }
    return best < 0 ? null : { type: base.types[base.typeIndex[best]], x: clientX - rect.left, y: clientY - rect.top };
  };

  return (
    <div
      role="img"
      aria-label={label}
      className="relative overflow-hidden rounded-md border border-soot-700"
      style={{ width: sizePx, height: sizePx }}
      onPointerMove={(e) => setHover(find(e.clientX, e.clientY, e.currentTarget))}
      onPointerDown={(e) => setHover(find(e.clientX, e.clientY, e.currentTarget))}
      onPointerLeave={(e) => { if (e.pointerType === "mouse") setHover(null); }}
    >
      <Stage width={sizePx} height={sizePx} listening={false}>
        <Layer listening={false}>
          <Shape
            listening={false}
            perfectDrawEnabled={false}
            sceneFunc={(ctx) => {
              const c = ctx._context;
              c.fillStyle = matrix === "hardened" ? MATRIX_COLOUR.hardened : MATRIX_COLOUR.annealed;
              c.fillRect(0, 0, sizePx, sizePx);
              c.strokeStyle = matrix === "hardened" ? MATRIX_COLOUR.hardenedNeedle : MATRIX_COLOUR.annealedGrain;
              c.lineWidth = matrix === "hardened" ? Math.max(1, scale * 0.25) : 1;
              c.beginPath();
              for (const [x1, y1, x2, y2] of background) { c.moveTo(x1 * scale, y1 * scale); c.lineTo(x2 * scale, y2 * scale); }
              c.stroke();
            }}
          />
        </Layer>
        <Layer ref={particleLayer} listening={false}>
          <Shape
            listening={false}
            perfectDrawEnabled={false}
            sceneFunc={(ctx) => drawParticles(ctx._context, simRef.current.base, simRef.current.visible, scale)}
          />
        </Layer>
      </Stage>
      <ScaleBar pxPerUm={scale} />
      {hover ? (
        <div
          className="pointer-events-none absolute z-10 max-w-60 rounded-sm border border-soot-700 bg-bone-50 px-2 py-1.5 text-xs text-soot-900 shadow-card"
          style={{ left: Math.min(hover.x + 12, sizePx - 240), top: Math.min(hover.y + 12, sizePx - 90) }}
        >
          <p className="font-semibold">{carbideInfo(hover.type).title}</p>
          <p>{carbideInfo(hover.type).detail}</p>
        </div>
      ) : null}
    </div>
  );
}

function drawParticles(c: CanvasRenderingContext2D, base: BaseField, visible: VisibleField, scale: number): void {
  const W = base.widthUm, H = base.heightUm;
  for (let t = 0; t < base.types.length; t++) {
    const type = base.types[t];
    const style = CARBIDE_STYLE[type];
    c.beginPath();
    let any = false;
    for (let k = 0; k < visible.count; k++) {
      const i = visible.index[k];
      if (base.typeIndex[i] !== t) continue;
      any = true;
      const r = visible.radiusUm[k];
      const x = base.xUm[i], y = base.yUm[i];
      // Periodic field: draw copies of particles that cross a border.
      const xs = x - r < 0 ? [x, x + W] : x + r > W ? [x, x - W] : [x];
      const ys = y - r < 0 ? [y, y + H] : y + r > H ? [y, y - H] : [y];
      for (const px of xs) for (const py of ys) {
        c.moveTo((px + r) * scale, py * scale);
        c.arc(px * scale, py * scale, r * scale, 0, Math.PI * 2);
      }
    }
    if (!any) continue;
    c.fillStyle = style.fill;
    c.fill();
    const tile = patternTile(type);
    if (tile) {
      const pattern = c.createPattern(tile, "repeat");
      if (pattern) { c.fillStyle = pattern; c.fill(); }
    }
    c.strokeStyle = style.mark;
    c.lineWidth = 1;
    c.stroke();
  }
}

/** Faint lines that suggest the matrix: martensite needles (hardened) or ferrite grain boundaries (annealed). */
function matrixTexture(matrix: "annealed" | "hardened", sizeUm: number): [number, number, number, number][] {
  const random = createRandom(matrix === "hardened" ? 17 : 29);
  const lines: [number, number, number, number][] = [];
  if (matrix === "hardened") {
    const count = Math.round(sizeUm * sizeUm * 0.35);
    for (let k = 0; k < count; k++) {
      const x = random() * sizeUm, y = random() * sizeUm;
      const angle = [0.5, 1.55, 2.6][Math.floor(random() * 3)] + (random() - 0.5) * 0.2;
      const len = 0.8 + random() * 2.4;
      lines.push([x, y, x + Math.cos(angle) * len, y + Math.sin(angle) * len]);
    }
  } else {
    const cell = 6;
    for (let gx = 0; gx < sizeUm; gx += cell) {
      for (let gy = 0; gy < sizeUm; gy += cell) {
        const x = gx + random() * cell, y = gy + random() * cell;
        lines.push([x, y, x + cell * (0.6 + random() * 0.5), y + (random() - 0.5) * cell]);
        lines.push([x, y, x + (random() - 0.5) * cell, y + cell * (0.6 + random() * 0.5)]);
      }
    }
  }
  return lines;
}
