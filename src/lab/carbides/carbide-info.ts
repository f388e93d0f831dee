import { CARBIDE_DATA, type CarbideType } from "@shared/metallurgy";

/** "VC (often VC0.88, V8C7), about 2800 HV (2500–3000)": the name a hover or tap shows. */
export function carbideInfo(type: CarbideType): { title: string; detail: string } {
  const d = CARBIDE_DATA[type];
  return {
    title: `${type}: ${d.formula}`,
    detail: `Typical hardness about ${d.typicalHv} HV (reported ${d.hvRange[0]}–${d.hvRange[1]} HV); ${d.structure}; typical in ${d.typicalIn}.`,
  };
}
