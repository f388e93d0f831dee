import { useEffect, useRef } from "react";
import { createRandom } from "@shared/metallurgy/random";

interface MicroFieldProps {
  /** "network": coarse plates along dendrite-cell boundaries (ingot); "dispersed": fine particles (powder). */
  kind: "network" | "dispersed";
  /** Carbide volume fraction (0–1), drawn as area fraction. */
  volumeFraction: number;
  carbideSizeUm: number;
  armSpacingUm: number;
  /** Width of the field, µm. */
  fieldUm?: number;
  sizePx: number;
  label: string;
}

/**
 * A sketch of the carbides at one magnification (same field width for both routes), so the
 * difference in size and spread is seen at a glance. Schematic: positions are random (seeded);
 * sizes, spacing and area fraction come from the model.
 */
export function MicroField({ kind, volumeFraction, carbideSizeUm, armSpacingUm, fieldUm = 100, sizePx, label }: MicroFieldProps) {
  const ref = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const canvas = ref.current;
    const ctx = canvas?.getContext("2d");
    if (!canvas || !ctx) return;
    const ratio = window.devicePixelRatio || 1;
    canvas.width = sizePx * ratio;
    canvas.height = sizePx * ratio;
    ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
    const scale = sizePx / fieldUm;
    const rng = createRandom(kind === "network" ? 5 : 9);
    ctx.fillStyle = "#ebe3d5";
    ctx.fillRect(0, 0, sizePx, sizePx);
    ctx.fillStyle = "#1a1714";
    const area = fieldUm * fieldUm * Math.max(0, Math.min(0.6, volumeFraction));
    if (kind === "dispersed") {
      const d = Math.max(0.25, carbideSizeUm);
      const count = Math.min(20000, Math.round(area / (Math.PI * (d / 2) ** 2)));
      for (let k = 0; k < count; k++) {
        const r = Math.max(0.5, (d / 2) * scale * (0.6 + 0.8 * rng()));
        ctx.beginPath();
        ctx.arc(rng() * sizePx, rng() * sizePx, r, 0, Math.PI * 2);
        ctx.fill();
      }
    } else {
      const spacing = Math.max(4, armSpacingUm);
      const length = Math.max(2, carbideSizeUm);
      const width = Math.max(1.5, length / 6);
      // Boundaries: a jittered square grid of cells λ2 across, at least one line each way.
      const lines: [number, number, number, number][] = [];
      // Start inside the field so at least one boundary crosses it, however coarse the cells.
      for (let p = rng() * Math.min(spacing, fieldUm * 0.8) + fieldUm * 0.1 * Number(spacing > fieldUm); p < fieldUm; p += spacing) {
        const a = p + (rng() - 0.5) * spacing * 0.3;
        const b = p + (rng() - 0.5) * spacing * 0.3;
        lines.push([0, a, fieldUm, b], [a, 0, b, fieldUm]);
      }
      if (lines.length === 0) lines.push([0, fieldUm * 0.45, fieldUm, fieldUm * 0.6]);
      const boundaryUm = lines.reduce((s, [x0, y0, x1, y1]) => s + Math.hypot(x1 - x0, y1 - y0), 0);
      const plates = Math.max(1, Math.round(area / (length * width)));
      const pitch = boundaryUm / plates;
      for (const [x0, y0, x1, y1] of lines) {
        const len = Math.hypot(x1 - x0, y1 - y0);
        const ux = (x1 - x0) / len;
        const uy = (y1 - y0) / len;
        for (let s = rng() * pitch; s < len; s += pitch) {
          const l = length * (0.6 + 0.8 * rng());
          const cx = x0 + ux * s;
          const cy = y0 + uy * s;
          ctx.save();
          ctx.translate(cx * scale, cy * scale);
          ctx.rotate(Math.atan2(uy, ux) + (rng() - 0.5) * 0.5);
          ctx.beginPath();
          const hl = (l / 2) * scale;
          const hw = (width / 2) * scale;
          ctx.moveTo(-hl, 0);
          ctx.lineTo(-hl * 0.4, -hw);
          ctx.lineTo(hl * 0.5, -hw * 0.8);
          ctx.lineTo(hl, 0);
          ctx.lineTo(hl * 0.3, hw);
          ctx.lineTo(-hl * 0.5, hw * 0.9);
          ctx.closePath();
          ctx.fill();
          ctx.restore();
        }
      }
    }
    // Scale bar: 20 µm.
    const bar = 20 * scale;
    ctx.fillStyle = "#fcfaf6";
    ctx.fillRect(sizePx - bar - 12, sizePx - 22, bar + 8, 16);
    ctx.fillStyle = "#1a1714";
    ctx.fillRect(sizePx - bar - 8, sizePx - 12, bar, 3);
    ctx.font = "600 9px 'Inter Variable', system-ui, sans-serif";
    ctx.textAlign = "center";
    ctx.fillText("20 µm", sizePx - bar / 2 - 8, sizePx - 15);
  }, [kind, volumeFraction, carbideSizeUm, armSpacingUm, fieldUm, sizePx]);
  return <canvas ref={ref} role="img" aria-label={label} style={{ width: sizePx, height: sizePx }} className="rounded-sm border border-soot-700/40" />;
}
