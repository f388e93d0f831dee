import { useCallback, useEffect, useImperativeHandle, useMemo, useRef, type Ref } from "react";
import { Image as KonvaImage, Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import type { PassiveFilmState, SitePoint } from "@shared/sim/passive-film";
import { HALO_WIDTH_SITES } from "@shared/sim/passive-film";
import { measured } from "@/lab/shared-ui/bench-marks";
import { paintAll, paintChanged, type DisplayMode } from "./paint";
import { SURFACE_COLOURS } from "./palette";

export interface SurfaceCanvasHandle {
  /** Repaint the sites the last step or scratch changed. */
  paintChanged: () => void;
  /** Repaint every site (new state, new display mode). */
  paintAll: () => void;
}

interface SurfaceCanvasProps {
  ref?: Ref<SurfaceCanvasHandle>;
  state: PassiveFilmState;
  mode: DisplayMode;
  sizePx: number;
  scratchTool: boolean;
  scratchPaths: readonly SitePoint[][];
  onScratchSegment: (from: SitePoint, to: SitePoint) => void;
  onScratchEnd: () => void;
}

/**
 * The surface as one Konva.Image of an L×L offscreen canvas (one pixel per site, scaled up without
 * smoothing), plus one vector Shape for carbides and scratch paths. Only changed pixels are rewritten.
 */
export function SurfaceCanvas({ ref, state, mode, sizePx, scratchTool, scratchPaths, onScratchSegment, onScratchEnd }: SurfaceCanvasProps) {
  const L = state.sizeSites;
  const buffer = useMemo(() => {
    const canvas = document.createElement("canvas");
    canvas.width = L;
    canvas.height = L;
    const ctx = canvas.getContext("2d");
    if (!ctx) throw new Error("2-D canvas is not available");
    const image = ctx.createImageData(L, L);
    return { canvas, ctx, image, pixels: new Uint32Array(image.data.buffer) };
  }, [L]);
  const imageRef = useRef<Konva.Image>(null);
  const stateRef = useRef(state);
  stateRef.current = state;
  const modeRef = useRef(mode);
  modeRef.current = mode;

  // Draw synchronously (inside the measured block), not on Konva's next batch.
  const redraw = useCallback(() => { imageRef.current?.getLayer()?.draw(); }, []);
  const repaintAll = useCallback(() => {
    measured("passive-film:paint", () => {
      paintAll(buffer.pixels, stateRef.current, modeRef.current);
      buffer.ctx.putImageData(buffer.image, 0, 0);
      redraw();
    });
  }, [buffer, redraw]);
  const repaintChanged = useCallback(() => {
    measured("passive-film:paint", () => {
      const r = paintChanged(buffer.pixels, stateRef.current, modeRef.current);
      if (!r) return;
      buffer.ctx.putImageData(buffer.image, 0, 0, r.x, r.y, r.width, r.height);
      redraw();
    });
  }, [buffer, redraw]);

  useImperativeHandle(ref, () => ({ paintChanged: repaintChanged, paintAll: repaintAll }), [repaintChanged, repaintAll]);
  useEffect(() => { repaintAll(); }, [state, mode, sizePx, repaintAll]);

  const scale = sizePx / L;
  const dragging = useRef<SitePoint | null>(null);
  const toSite = (e: React.PointerEvent<HTMLDivElement>): SitePoint => {
    const rect = e.currentTarget.getBoundingClientRect();
    return { x: ((e.clientX - rect.left) / rect.width) * L, y: ((e.clientY - rect.top) / rect.height) * L };
  };

  return (
    <div
      role="img"
      aria-label={`Steel surface, ${L} × ${L} sites: film, rust and bare metal. The summary below describes it.`}
      className="relative overflow-hidden rounded-md border border-soot-700 bg-soot-950"
      style={{ width: sizePx, height: sizePx, touchAction: scratchTool ? "none" : "auto", cursor: scratchTool ? "crosshair" : "default" }}
      onPointerDown={(e) => {
        if (!scratchTool) return;
        e.currentTarget.setPointerCapture(e.pointerId);
        const p = toSite(e);
        dragging.current = p;
        onScratchSegment(p, p);
      }}
      onPointerMove={(e) => {
        if (!dragging.current) return;
        const p = toSite(e);
        onScratchSegment(dragging.current, p);
        dragging.current = p;
      }}
      onPointerUp={() => { if (dragging.current) { dragging.current = null; onScratchEnd(); } }}
      onPointerCancel={() => { if (dragging.current) { dragging.current = null; onScratchEnd(); } }}
    >
      <Stage width={sizePx} height={sizePx} listening={false}>
        <Layer listening={false} imageSmoothingEnabled={false}>
          <KonvaImage ref={imageRef} image={buffer.canvas} width={sizePx} height={sizePx} listening={false} perfectDrawEnabled={false} />
        </Layer>
        <Layer listening={false}>
          <Shape
            listening={false}
            perfectDrawEnabled={false}
            sceneFunc={(ctx) => {
              const c = ctx._context;
              // Carbide particles: filled disc, light outline; Cr-depleted halo as a dashed ring.
              c.lineWidth = Math.max(1, scale * 0.6);
              for (const p of state.particles) {
                c.beginPath();
                c.arc(p.x * scale, p.y * scale, p.radiusSites * scale, 0, Math.PI * 2);
                c.strokeStyle = SURFACE_COLOURS.carbideOutline;
                c.setLineDash([]);
                c.stroke();
                // Two-tone dashes, so the ring shows on the pale film and on dark bare metal alike.
                const dash = Math.max(2, scale * 1.2);
                c.setLineDash([dash, dash]);
                for (const [colour, offset] of [[SURFACE_COLOURS.halo, 0], [SURFACE_COLOURS.haloDark, dash]] as const) {
                  c.beginPath();
                  c.arc(p.x * scale, p.y * scale, (p.radiusSites + HALO_WIDTH_SITES) * scale, 0, Math.PI * 2);
                  c.strokeStyle = colour;
                  c.lineDashOffset = offset;
                  c.stroke();
                }
                c.lineDashOffset = 0;
              }
              // Scratch paths: a dashed centre line, so a healed scratch can still be found.
              c.setLineDash([6, 5]);
              c.lineWidth = 1.5;
              c.strokeStyle = SURFACE_COLOURS.scratch;
              for (const path of scratchPaths) {
                if (path.length < 2) continue;
                c.beginPath();
                c.moveTo(path[0].x * scale, path[0].y * scale);
                for (const q of path.slice(1)) c.lineTo(q.x * scale, q.y * scale);
                c.stroke();
              }
              c.setLineDash([]);
            }}
          />
        </Layer>
      </Stage>
    </div>
  );
}
