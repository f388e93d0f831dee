import type { CarbideType } from "@shared/metallurgy";
import { CARBIDE_STYLE } from "./palette";

/** A small tile with a type's pattern marks on transparent ground, for ctx.createPattern. */
function tile(type: CarbideType): HTMLCanvasElement {
  const size = 6;
  const c = document.createElement("canvas");
  c.width = size;
  c.height = size;
  const ctx = c.getContext("2d")!;
  const { mark, pattern } = CARBIDE_STYLE[type];
  ctx.fillStyle = mark;
  ctx.strokeStyle = mark;
  ctx.lineWidth = 1.2;
  if (pattern === "hatch") {
    ctx.beginPath();
    ctx.moveTo(-1, size + 1); ctx.lineTo(size + 1, -1);
    ctx.moveTo(-1, 1); ctx.lineTo(1, -1);
    ctx.moveTo(size - 1, size + 1); ctx.lineTo(size + 1, size - 1);
    ctx.stroke();
  } else if (pattern === "dots") {
    ctx.beginPath(); ctx.arc(3, 3, 1.2, 0, Math.PI * 2); ctx.fill();
  } else if (pattern === "cross") {
    ctx.fillRect(0, 2.5, size, 1); ctx.fillRect(2.5, 0, 1, size);
  } else if (pattern === "stipple") {
    ctx.fillRect(0, 0, 1.5, 1.5); ctx.fillRect(3, 3, 1.5, 1.5);
  }
  return c;
}

const cache = new Map<CarbideType, HTMLCanvasElement>();

/** The pattern tile of a carbide type (null for a plain fill). */
export function patternTile(type: CarbideType): HTMLCanvasElement | null {
  if (CARBIDE_STYLE[type].pattern === "none") return null;
  let t = cache.get(type);
  if (!t) { t = tile(type); cache.set(type, t); }
  return t;
}
