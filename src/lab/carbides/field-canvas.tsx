import { useEffect, useImperativeHandle, useMemo, useRef, useState, type Ref } from "react";
import { Image as KonvaImage, Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import type { CarbideType } from "@shared/metallurgy";
import type { BaseField, CarbideSimState, VisibleField } from "@shared/sim/carbides";
import { measured } from "@/lab/shared-ui/bench-marks";
import { carbideInfo } from "./carbide-info";
import { DETAIL_RADIUS_PX, matrixPixels, stampSmallParticles } from "./field-raster";
import { CARBIDE_STYLE } from "./palette";
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
 * The micrograph-like field in two Konva nodes: one Image whose pixels are the cached matrix picture with
 * every small particle stamped in (software canvases rasterise thousands of tiny arcs slowly), and one
 * custom Shape that draws the larger particles as vector discs with their type's pattern and outline,
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
  // Device pixels of the raster (sharp on high-density screens, at most 2× to bound the cost).
  const dpr = typeof window === "undefined" ? 1 : Math.min(2, window.devicePixelRatio || 1);
  const rasterPx = Math.round(sizePx * dpr);
  const raster = useMemo(() => {
    const canvas = document.createElement("canvas");
    canvas.width = rasterPx;
    canvas.height = rasterPx;
    const ctx = canvas.getContext("2d")!;
    const image = ctx.createImageData(rasterPx, rasterPx);
    return { canvas, ctx, image, pixels: new Uint32Array(image.data.buffer), background: matrixPixels(matrix, base.widthUm, rasterPx) };
  }, [rasterPx, matrix, base.widthUm]);

  // Draw synchronously (measured for the frame benchmark), not on Konva's next batch.
  const redraw = () => {
    measured("carbides:draw", () => {
      raster.pixels.set(raster.background);
      stampSmallParticles(raster.pixels, rasterPx, simRef.current.base, simRef.current.visible);
      raster.ctx.putImageData(raster.image, 0, 0);
      particleLayer.current?.draw();
    });
  };
  useImperativeHandle(ref, () => ({ redraw }));
  useEffect(() => { redraw(); }, [sim, sizePx, raster]);

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
        <Layer ref={particleLayer} listening={false}>
          <KonvaImage image={raster.canvas} width={sizePx} height={sizePx} listening={false} perfectDrawEnabled={false} />
          <Shape
            listening={false}
            perfectDrawEnabled={false}
            sceneFunc={(ctx) => drawLargeParticles(ctx._context, simRef.current.base, simRef.current.visible, scale, dpr)}
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

/** The particles too large to stamp: vector discs with the type's fill, pattern and outline. */
function drawLargeParticles(c: CanvasRenderingContext2D, base: BaseField, visible: VisibleField, scale: number, dpr: number): void {
  const W = base.widthUm, H = base.heightUm;
  for (let t = 0; t < base.types.length; t++) {
    const type = base.types[t];
    const style = CARBIDE_STYLE[type];
    const path = new Path2D();
    let any = false;
    for (let k = 0; k < visible.count; k++) {
      const i = visible.index[k];
      const r = visible.radiusUm[k];
      if (base.typeIndex[i] !== t || r * scale * dpr < DETAIL_RADIUS_PX) continue;
      any = true;
      const x = base.xUm[i], y = base.yUm[i];
      // Periodic field: draw copies of particles that cross a border.
      const xs = x - r < 0 ? [x, x + W] : x + r > W ? [x, x - W] : [x];
      const ys = y - r < 0 ? [y, y + H] : y + r > H ? [y, y - H] : [y];
      for (const px of xs) for (const py of ys) {
        path.moveTo((px + r) * scale, py * scale);
        path.arc(px * scale, py * scale, r * scale, 0, Math.PI * 2);
      }
    }
    if (!any) continue;
    c.fillStyle = style.fill;
    c.fill(path);
    const tile = patternTile(type);
    if (tile) {
      const pattern = c.createPattern(tile, "repeat");
      if (pattern) { c.fillStyle = pattern; c.fill(path); }
    }
    c.strokeStyle = style.mark;
    c.lineWidth = 1;
    c.stroke(path);
  }
}
