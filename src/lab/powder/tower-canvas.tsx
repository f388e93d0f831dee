import { useEffect, useImperativeHandle, useMemo, useRef, type Ref } from "react";
import { Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import type { ClassResult } from "@shared/sim/powder/classes";
import { dropletAt, type DropletView, type TowerLayout, type TowerState } from "@shared/sim/powder/tower";
import { formatNumber } from "@shared/sim/alloy/format";
import { incandescence } from "@/lab/shared-ui/incandescence";
import { measured } from "@/lab/shared-ui/bench-marks";

export interface TowerCanvasHandle {
  redraw: () => void;
}

interface TowerCanvasProps {
  ref?: Ref<TowerCanvasHandle>;
  classes: readonly ClassResult[];
  layout: TowerLayout;
  /** Mutable animation state, read on every redraw. */
  towerRef: { readonly current: TowerState };
  gasLabel: string;
  widthPx: number;
  stale: boolean;
}

const COLOURS = {
  label: "#ebe3d5",
  muted: "#a39a8f",
  wall: "#6b625a",
  nozzle: "#c4bbb0",
  jet: "#68a0c6",
  solidOutline: "#0f0d0b",
  freezingRing: "#fcfaf6",
  marker: "#97bfd9",
};

/**
 * The atomising tower: nozzle and gas jets at the top, droplets falling through the chamber,
 * each coloured by its temperature; frozen droplets carry a dark outline and freezing ones a
 * light ring, so the state is not shown by colour alone. Markers on the right show where the
 * fine, median and coarse droplets are fully solid.
 */
export function TowerCanvas({ ref, classes, layout, towerRef, gasLabel, widthPx, stale }: TowerCanvasProps) {
  const narrow = widthPx < 520;
  const heightPx = narrow ? 400 : 460;
  const axisW = narrow ? 50 : 68;
  const labelW = narrow ? 0 : 170;
  const chamberX = axisW + 6;
  const chamberW = Math.max(140, widthPx - chamberX - labelW - 10);
  const top = 64;
  const bottom = heightPx - 22;
  const cx = chamberX + chamberW / 2;
  const shapeRef = useRef<Konva.Shape>(null);
  const scratch = useRef<DropletView>({ fallM: 0, tempK: 0, solidFraction: 0, diameterM: 0 });
  const props = useRef({ classes, layout, stale });
  props.current = { classes, layout, stale };

  useImperativeHandle(ref, () => ({ redraw: () => shapeRef.current?.getLayer()?.batchDraw() }), []);
  useEffect(() => {
    shapeRef.current?.getLayer()?.batchDraw();
  }, [classes, layout, stale, widthPx]);

  const markers = useMemo(() => freezeMarkers(classes), [classes]);
  // Square-root depth scale: most droplets freeze in the first few per cent of the tower.
  const yOf = (fallM: number) => top + Math.sqrt(Math.max(0, Math.min(1, fallM / layout.heightM))) * (bottom - top);

  const drawStatic = (ctx: Konva.Context) => {
    const c = ctx._context;
    // Chamber.
    c.fillStyle = "#1a1714";
    c.fillRect(chamberX, top - 8, chamberW, bottom - top + 8);
    c.strokeStyle = COLOURS.wall;
    c.lineWidth = 2;
    c.strokeRect(chamberX, top - 8, chamberW, bottom - top + 8);
    // Nozzle and gas jets.
    c.fillStyle = COLOURS.nozzle;
    c.beginPath();
    c.moveTo(cx - 34, 14);
    c.lineTo(cx + 34, 14);
    c.lineTo(cx + 12, top - 14);
    c.lineTo(cx - 12, top - 14);
    c.closePath();
    c.fill();
    c.fillStyle = incandescence(1500);
    c.fillRect(cx - 3, top - 14, 6, 14);
    c.strokeStyle = COLOURS.jet;
    c.lineWidth = 2;
    c.setLineDash([5, 4]);
    for (const side of [-1, 1]) {
      c.beginPath();
      c.moveTo(cx + side * 30, top - 22);
      c.lineTo(cx + side * 4, top + 6);
      c.stroke();
    }
    c.setLineDash([]);
    c.font = "600 12px 'Inter Variable', system-ui, sans-serif";
    c.fillStyle = COLOURS.label;
    c.textBaseline = "middle";
    c.textAlign = "left";
    c.fillText("melt", cx + 40, 22);
    c.fillStyle = COLOURS.marker;
    c.fillText(`${gasLabel} jet`, cx + 40, top - 20);
    // Depth axis.
    c.fillStyle = COLOURS.muted;
    c.strokeStyle = COLOURS.muted;
    c.lineWidth = 1;
    c.textAlign = "right";
    c.font = "500 11px 'JetBrains Mono Variable', ui-monospace, monospace";
    let lastY = -Infinity;
    for (const fall of depthTicks(layout.heightM)) {
      const y = yOf(fall);
      if (y - lastY < 24) continue;
      lastY = y;
      c.beginPath();
      c.moveTo(chamberX - 5, y);
      c.lineTo(chamberX, y);
      c.stroke();
      c.fillText(formatDepth(fall), chamberX - 8, y);
    }
    if (!narrow) {
      c.save();
      c.translate(12, (top + bottom) / 2);
      c.rotate(-Math.PI / 2);
      c.textAlign = "center";
      c.font = "500 11px 'Inter Variable', system-ui, sans-serif";
      c.fillText("distance below the nozzle (√ scale)", 0, 0);
      c.restore();
    }
  };

  const drawDroplets = (ctx: Konva.Context) => {
    measured("powder:draw", () => {
      const c = ctx._context;
      const { classes: cls, layout: lay, stale: dim } = props.current;
      const tower = towerRef.current;
      const v = scratch.current;
      c.save();
      c.beginPath();
      c.rect(chamberX + 1, top - 7, chamberW - 2, bottom - top + 6);
      c.clip();
      c.globalAlpha = dim ? 0.5 : 1;
      for (const d of tower.droplets) {
        dropletAt(d, cls, tower.timeS, v);
        const depth = Math.min(1, v.fallM / lay.heightM);
        const y = top + Math.sqrt(depth) * (bottom - top);
        const x = cx + d.spread * (0.04 + 0.44 * Math.sqrt(depth)) * (chamberW / 2);
        const r = Math.max(1.3, Math.min(6.5, 1.3 + 2.6 * Math.log10(v.diameterM / 8e-6)));
        c.beginPath();
        c.arc(x, y, r, 0, Math.PI * 2);
        c.fillStyle = incandescence(v.tempK - 273.15);
        c.fill();
        if (v.solidFraction >= 0.999) {
          c.lineWidth = 1.2;
          c.strokeStyle = COLOURS.solidOutline;
          c.stroke();
        } else if (v.solidFraction > 0) {
          c.lineWidth = 1;
          c.strokeStyle = COLOURS.freezingRing;
          c.beginPath();
          c.arc(x, y, r + 1.6, 0, Math.PI * 2);
          c.stroke();
        }
      }
      c.restore();
      drawMarkers(c);
    });
  };

  // Where the fine, median and coarse droplets are solid: drawn over the droplets, on a dark label.
  const drawMarkers = (c: CanvasRenderingContext2D) => {
    c.font = "500 11px 'Inter Variable', system-ui, sans-serif";
    c.textBaseline = "middle";
    for (const m of markers) {
      if (!Number.isFinite(m.fallM) || m.fallM > layout.heightM) continue;
      const y = yOf(m.fallM);
      c.strokeStyle = COLOURS.marker;
      c.setLineDash([3, 3]);
      c.beginPath();
      c.moveTo(chamberX, y);
      c.lineTo(chamberX + chamberW + (narrow ? 0 : 8), y);
      c.stroke();
      c.setLineDash([]);
      c.fillStyle = COLOURS.marker;
      if (narrow) {
        const text = `${m.label}: solid`;
        const w = c.measureText(text).width;
        c.fillStyle = "rgba(15,13,11,0.8)";
        c.fillRect(chamberX + chamberW - w - 8, y - 15, w + 6, 14);
        c.fillStyle = COLOURS.marker;
        c.textAlign = "right";
        c.fillText(text, chamberX + chamberW - 5, y - 8);
      } else {
        c.textAlign = "left";
        c.fillText(`${m.label}`, chamberX + chamberW + 12, y - 7);
        c.fillStyle = COLOURS.muted;
        c.fillText("fully solid here", chamberX + chamberW + 12, y + 7);
      }
    }
  };

  return (
    <div className="overflow-hidden rounded-md border border-soot-700 bg-soot-900" style={{ width: widthPx, height: heightPx }}>
      <Stage width={widthPx} height={heightPx} listening={false}>
        <Layer listening={false}>
          <Shape key={`${widthPx}-${layout.heightM}-${markers.map((m) => m.fallM).join()}`} sceneFunc={drawStatic} listening={false} perfectDrawEnabled={false} />
        </Layer>
        <Layer listening={false}>
          <Shape ref={shapeRef} sceneFunc={drawDroplets} listening={false} perfectDrawEnabled={false} />
        </Layer>
      </Stage>
    </div>
  );
}

function depthTicks(heightM: number): number[] {
  const out = [0];
  for (const m of [0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20]) if (m <= heightM + 1e-9) out.push(m);
  return out;
}

function formatDepth(m: number): string {
  if (m === 0) return "0";
  return m < 1 ? `${formatNumber(m * 100, 2)} cm` : `${formatNumber(m, 2)} m`;
}

/** The classes holding 16 %, 50 % and 84 % of the mass: fine, median, coarse. */
function freezeMarkers(classes: readonly ClassResult[]): { label: string; fallM: number }[] {
  const total = classes.reduce((s, c) => s + c.massFraction, 0);
  const out: { label: string; fallM: number }[] = [];
  const targets: [number, string][] = [
    [0.16, "fine"],
    [0.5, "median"],
    [0.84, "coarse"],
  ];
  let cumulative = 0;
  let t = 0;
  for (const c of classes) {
    cumulative += c.massFraction / total;
    while (t < targets.length && cumulative >= targets[t][0]) {
      out.push({ label: `${targets[t][1]} ${formatNumber(c.diameterM * 1e6, 2)} µm`, fallM: c.solidAtFallM });
      t++;
    }
  }
  return out;
}
