import { useEffect, useImperativeHandle, useMemo, useRef, type Ref } from "react";
import { Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import { createRandom } from "@shared/metallurgy/random";
import type { IngotElement, Mould } from "@shared/sim/ingot/params";
import type { IngotRun } from "@shared/sim/ingot/run";
import type { Fronts, IngotFrameView } from "@shared/sim/ingot/frames";
import { formatDuration } from "@shared/sim/alloy/format";
import { incandescence, segregationColour } from "@/lab/shared-ui/incandescence";
import { measured } from "@/lab/shared-ui/bench-marks";
import { INGOT_COLOURS, MOULD_STYLE } from "./palette";

export interface IngotCanvasHandle {
  /** Redraw the moving layer after the frame buffers changed. */
  redraw: () => void;
}

interface IngotCanvasProps {
  ref?: Ref<IngotCanvasHandle>;
  run: IngotRun;
  /** Reused buffers: the canvas reads them on every redraw. */
  frame: IngotFrameView;
  /** Read on every redraw (the animation loop replaces its value). */
  frontsRef: { readonly current: Fronts };
  element: IngotElement;
  mould: Mould;
  widthPx: number;
  /** Dim the picture while a newer run is computed. */
  stale: boolean;
}

const PAD = 12;
const FOOTER = 26;

/**
 * The ingot's round cross-section: the left half coloured by temperature (the glow of hot
 * steel), the right half by the chosen element relative to the melt; the mushy zone hatched,
 * the solidus front a solid line, the liquidus front dashed, and coarse primary carbides as
 * dark angular marks. One Konva Shape draws the moving picture from the frame buffers, so a
 * frame costs one pass over the nodes; the mould sits on its own static layer.
 */
export function IngotCanvas({ ref, run, frame, frontsRef, element, mould, widthPx, stale }: IngotCanvasProps) {
  // On a narrow canvas the clock gets its own row above the half labels.
  const narrow = widthPx < 520;
  const HEADER = narrow ? 54 : 34;
  const labelY = narrow ? 40 : HEADER / 2;
  const diameter = Math.max(180, Math.min(widthPx - 2 * PAD, 460));
  const heightPx = diameter + HEADER + FOOTER + PAD;
  const cx = widthPx / 2;
  const cy = HEADER + diameter / 2;
  const mouldOuter = diameter / 2;
  const ingotR = mouldOuter * 0.86;
  const shapeRef = useRef<Konva.Shape>(null);

  const props = useRef({ run, frame, element, stale });
  props.current = { run, frame, element, stale };

  useImperativeHandle(ref, () => ({ redraw: () => shapeRef.current?.getLayer()?.batchDraw() }), []);
  useEffect(() => {
    shapeRef.current?.getLayer()?.batchDraw();
  }, [run, element, stale, widthPx]);

  // Carbide marks: fixed, seeded positions per node, so they do not flicker between frames.
  const carbideMarks = useMemo(() => placeCarbides(run), [run]);

  const drawSection = (ctx: Konva.Context) => {
    measured("ingot:draw", () => {
      const c = ctx._context;
      const { run: r, frame: f, element: el, stale: dim } = props.current;
      const fr = frontsRef.current;
      const n = r.cells;
      const scale = ingotR / r.radiusM;
      const nominal = r.nominalMassPct[el] ?? 0;
      const half = (startAngle: number, colourOf: (i: number) => string) => {
        for (let i = 0; i < n; i++) {
          const x0 = i === 0 ? 0 : 0.5 * (r.positionM[i - 1] + r.positionM[i]);
          const x1 = i === n - 1 ? r.radiusM : 0.5 * (r.positionM[i] + r.positionM[i + 1]);
          const outer = (r.radiusM - x0) * scale;
          const inner = Math.max(0, (r.radiusM - x1) * scale);
          c.beginPath();
          c.arc(cx, cy, outer + 0.6, startAngle, startAngle + Math.PI);
          c.arc(cx, cy, inner, startAngle + Math.PI, startAngle, true);
          c.closePath();
          c.fillStyle = colourOf(i);
          c.fill();
        }
      };
      c.save();
      c.globalAlpha = dim ? 0.55 : 1;
      half(Math.PI / 2, (i) => incandescence(f.tempC[i]));
      const means = f.meanMassPct;
      if (means && nominal > 0) half(-Math.PI / 2, (i) => segregationColour(means[i] / nominal));
      else half(-Math.PI / 2, () => INGOT_COLOURS.noElement);

      // Mushy zone: hatching between the solidus and liquidus fronts (not colour alone).
      const rSol = (r.radiusM - fr.solidusFrontM) * scale;
      const rLiq = Math.max(0, (r.radiusM - fr.liquidusFrontM) * scale);
      if (rSol - rLiq > 0.5) {
        c.save();
        c.beginPath();
        c.arc(cx, cy, rSol, 0, Math.PI * 2);
        c.arc(cx, cy, rLiq, 0, Math.PI * 2, true);
        c.clip("evenodd");
        c.strokeStyle = INGOT_COLOURS.hatch;
        c.lineWidth = 1.2;
        c.beginPath();
        for (let d = -ingotR * 2; d < ingotR * 2; d += 7) {
          c.moveTo(cx + d - ingotR, cy - ingotR);
          c.lineTo(cx + d + ingotR, cy + ingotR);
        }
        c.stroke();
        c.restore();
      }
      // Fronts: solidus solid, liquidus dashed, each with a dark casing for contrast on any colour.
      const ring = (radius: number, dash: number[]) => {
        if (radius <= 0.5 || radius >= ingotR - 0.5) return;
        for (const [colour, width] of [
          [INGOT_COLOURS.frontCasing, 4],
          [INGOT_COLOURS.front, 1.8],
        ] as const) {
          c.beginPath();
          c.setLineDash(dash);
          c.arc(cx, cy, radius, 0, Math.PI * 2);
          c.strokeStyle = colour;
          c.lineWidth = width;
          c.stroke();
        }
        c.setLineDash([]);
      };
      ring(rSol, []);
      ring(rLiq, [6, 5]);

      // Coarse primary carbides in nodes that are fully solid at this moment.
      c.lineWidth = 1;
      for (const mark of carbideMarks) {
        if (f.solidFraction[mark.node] < 0.999) continue;
        const rad = (r.radiusM - mark.xM) * scale;
        const x = cx + rad * Math.cos(mark.angle);
        const y = cy + rad * Math.sin(mark.angle);
        const s = mark.sizePx;
        c.beginPath();
        c.moveTo(x, y - s);
        c.lineTo(x + s * 0.8, y);
        c.lineTo(x, y + s * 0.7);
        c.lineTo(x - s * 0.9, y + s * 0.1);
        c.closePath();
        c.fillStyle = INGOT_COLOURS.carbide;
        c.strokeStyle = INGOT_COLOURS.carbideOutline;
        c.fill();
        c.stroke();
      }
      c.restore();

      // Split line and labels.
      c.strokeStyle = INGOT_COLOURS.split;
      c.lineWidth = 1.5;
      c.setLineDash([3, 3]);
      c.beginPath();
      c.moveTo(cx, cy - mouldOuter - 4);
      c.lineTo(cx, cy + mouldOuter + 4);
      c.stroke();
      c.setLineDash([]);
      c.font = "600 13px 'Inter Variable', system-ui, sans-serif";
      c.fillStyle = INGOT_COLOURS.label;
      c.textBaseline = "middle";
      c.textAlign = "right";
      c.fillText("Temperature", cx - 10, labelY);
      c.textAlign = "left";
      c.fillText(narrow ? `${el} ÷ melt` : `${el} relative to the melt`, cx + 10, labelY);
      c.textAlign = "left";
      c.font = "600 13px 'JetBrains Mono Variable', ui-monospace, monospace";
      c.fillText(`t = ${formatDuration(f.timeS)}`, PAD, narrow ? 15 : HEADER / 2);
    });
  };

  const drawMould = (ctx: Konva.Context) => {
    const c = ctx._context;
    const style = MOULD_STYLE[mould];
    c.beginPath();
    c.arc(cx, cy, mouldOuter, 0, Math.PI * 2);
    c.moveTo(cx + ingotR, cy);
    c.arc(cx, cy, ingotR, 0, Math.PI * 2, true);
    c.fillStyle = style.fill;
    c.fill("evenodd");
    c.strokeStyle = style.edge;
    c.lineWidth = 1.5;
    c.stroke();
    // A texture per mould so the type is not told by colour alone.
    const rng = createRandom(7);
    const mid = (mouldOuter + ingotR) / 2;
    const band = mouldOuter - ingotR;
    if (mould === "sand") {
      c.fillStyle = style.texture;
      for (let k = 0; k < 420; k++) {
        const a = rng() * Math.PI * 2;
        const rr = ingotR + 1.5 + rng() * (band - 3);
        c.fillRect(cx + rr * Math.cos(a), cy + rr * Math.sin(a), 1.6, 1.6);
      }
    } else if (mould === "metal") {
      c.strokeStyle = style.texture;
      c.lineWidth = 1;
      for (let k = 0; k < 72; k++) {
        const a = (k / 72) * Math.PI * 2;
        c.beginPath();
        c.moveTo(cx + (ingotR + 2) * Math.cos(a), cy + (ingotR + 2) * Math.sin(a));
        c.lineTo(cx + (mouldOuter - 2) * Math.cos(a), cy + (mouldOuter - 2) * Math.sin(a));
        c.stroke();
      }
    } else {
      c.fillStyle = style.texture;
      c.strokeStyle = style.edge;
      for (let k = 0; k < 16; k++) {
        const a = (k / 16) * Math.PI * 2;
        c.beginPath();
        c.arc(cx + mid * Math.cos(a), cy + mid * Math.sin(a), Math.max(2, band * 0.28), 0, Math.PI * 2);
        c.fill();
        c.stroke();
      }
    }
    c.font = "500 12px 'Inter Variable', system-ui, sans-serif";
    c.fillStyle = INGOT_COLOURS.label;
    c.textAlign = "center";
    c.textBaseline = "middle";
    c.fillText(`${style.label} · ${run.sim.sizeMm} mm round ingot`, cx, cy + mouldOuter + FOOTER / 2 + 2);
  };

  return (
    <div className="overflow-hidden rounded-md border border-soot-700 bg-soot-900" style={{ width: widthPx, height: heightPx }}>
      <Stage width={widthPx} height={heightPx} listening={false}>
        <Layer listening={false}>
          <Shape key={`${mould}-${widthPx}-${run.sim.sizeMm}`} sceneFunc={drawMould} listening={false} perfectDrawEnabled={false} />
        </Layer>
        <Layer listening={false}>
          <Shape ref={shapeRef} sceneFunc={drawSection} listening={false} perfectDrawEnabled={false} />
        </Layer>
      </Stage>
    </div>
  );
}

interface CarbideMark {
  node: number;
  xM: number;
  angle: number;
  sizePx: number;
}

/** Seeded carbide marks in nodes flagged by the last-liquid rule; more where the liquid was richer. */
function placeCarbides(run: IngotRun): CarbideMark[] {
  const rng = createRandom(1234);
  const marks: CarbideMark[] = [];
  const n = run.cells;
  for (let i = 0; i < n; i++) {
    if (run.final.carbideRisk[i] === "none") continue;
    const x0 = i === 0 ? 0 : 0.5 * (run.positionM[i - 1] + run.positionM[i]);
    const x1 = i === n - 1 ? run.radiusM : 0.5 * (run.positionM[i] + run.positionM[i + 1]);
    // Ring area ∝ mean radius: keep the areal density of marks even across the section.
    const meanR = run.radiusM - 0.5 * (x0 + x1);
    const count = Math.max(1, Math.round((10 * meanR) / run.radiusM) + (run.final.carbideRisk[i] === "both" ? 2 : 0));
    for (let k = 0; k < count; k++) {
      marks.push({ node: i, xM: x0 + rng() * (x1 - x0), angle: rng() * Math.PI * 2, sizePx: 3 + rng() * 2.5 });
    }
  }
  return marks;
}
