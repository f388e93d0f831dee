import { runIngot } from "./shared/sim/ingot/run";
import { parseIngotSimParams } from "./shared/sim/ingot/params";
const r = runIngot(parseIngotSimParams({ grade: "D2", sizeMm: 300, mould: "sand", mixing: 1 }));
const g = Array.from({ length: r.frameCount - 1 }, (_, f) => +(r.frameTimeS[f + 1] - r.frameTimeS[f]).toFixed(2));
console.log(r.dtS, r.frameCount, JSON.stringify(g));
