import { useEffect, useImperativeHandle, useMemo, useRef, type Ref } from "react";
import { Group, Image as KonvaImage, Layer, Line, Stage, Text } from "react-konva";
import type Konva from "konva";
import { EDGE, PHASE, type EdgeState } from "@shared/sim/carbides";
import type { CanvasHandle } from "./field-canvas";
import { measured } from "@/lab/shared-ui/bench-marks";
import { paintEdge } from "./edge-paint";
import { ScaleBar } from "./scale-bar";

interface EdgeCanvasProps {
  ref?: Ref<CanvasHandle>;
  /** The live edge; read at draw time, so the frame loop can redraw without a React render. */
  edge: EdgeState;
  hardened: boolean;
  sizePx: number;
  mode: "edge" | "sharpen";
  stoneName: string;
  label: string;
}

/**
 * The edge cross-section: one Konva.Image of the cell grid (repainted when the edge changes) and a few
 * vector marks — the original sharp profile (dashed), and what is pressing on the edge.
 */
export function EdgeCanvas({ ref, edge, hardened, sizePx, mode, stoneName, label }: EdgeCanvasProps) {
  const n = edge.size;
  const buffer = useMemo(() => {
    const canvas = document.createElement("canvas");
    canvas.width = n;
    canvas.height = n;
    const ctx = canvas.getContext("2d")!;
    const image = ctx.createImageData(n, n);
    return { canvas, ctx, image, pixels: new Uint32Array(image.data.buffer) };
  }, [n]);
  const imageRef = useRef<Konva.Image>(null);
  const stockRef = useRef<Konva.Group>(null);

  const edgeRef = useRef(edge);
  edgeRef.current = edge;
  const redraw = () =>
    measured("carbides:draw", () => {
      paintEdge(buffer.pixels, edgeRef.current, hardened);
      buffer.ctx.putImageData(buffer.image, 0, 0);
      imageRef.current?.getLayer()?.draw();
      // The stock rests on the highest point of the edge.
      if (stockRef.current) {
        stockRef.current.y(Math.max(0, topRow(edgeRef.current) * (sizePx / n) - 5));
        stockRef.current.getLayer()?.draw();
      }
    });
  useImperativeHandle(ref, () => ({ redraw }));
  useEffect(() => { redraw(); }, [buffer, edge, hardened, sizePx]);

  const s = sizePx / n;
  const apex = edge.apexRow0 * s;
  const tanHalf = Math.tan((EDGE.includedAngleDeg / 2) * (Math.PI / 180));
  const half = sizePx / 2;
  const bottom = sizePx;
  const spread = (bottom - apex) * tanHalf;
  return (
    <div role="img" aria-label={label} className="relative overflow-hidden rounded-md border border-soot-700" style={{ width: sizePx, height: sizePx }}>
      <Stage width={sizePx} height={sizePx} listening={false}>
        <Layer listening={false} imageSmoothingEnabled={false}>
          <KonvaImage ref={imageRef} image={buffer.canvas} width={sizePx} height={sizePx} listening={false} perfectDrawEnabled={false} />
        </Layer>
        <Layer listening={false}>
          <Line points={[half - spread, bottom, half, apex, half + spread, bottom]} stroke="#9a3e08" strokeWidth={1.5} dash={[6, 5]} listening={false} />
          {mode === "edge" ? (
            <Group ref={stockRef} listening={false}>
              <Line points={[sizePx * 0.15, 0, sizePx * 0.85, 0]} stroke="#214c69" strokeWidth={4} listening={false} />
              <Text x={sizePx * 0.15} y={-18} width={sizePx * 0.7} align="center" text="quartz-loaded stock presses here ↓" fontSize={12} fill="#214c69" listening={false} />
            </Group>
          ) : (
            <Text x={8} y={8} width={sizePx - 16} text={`stone: ${stoneName}, on both bevels`} fontSize={12} fill="#214c69" listening={false} />
          )}
        </Layer>
      </Stage>
      <ScaleBar pxPerUm={sizePx / (n * edge.cellUm)} />
    </div>
  );
}

/** First row holding any solid cell. */
function topRow(e: EdgeState): number {
  for (let j = 0; j < e.phase.length; j++) if (e.phase[j] !== PHASE.air) return Math.floor(j / e.size);
  return e.size;
}
