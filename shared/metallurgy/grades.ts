import type { Composition } from "./composition";

/**
 * Standard grades used as presets by the simulations, lessons and notebook.
 * Named only by SAE/AISI, UNS and EN designations. Compositions are nominal mid-range
 * values inside each standard's limits (ASTM A29/SAE J403 carbon and alloy bars, ASTM A681
 * tool steels, ASTM A276 stainless bars) — [Mem] mid-range values chosen by us, rounded;
 * not a certificate of any heat. Where science-reference.md uses a grade in a check value,
 * the composition here matches it for the elements it lists.
 */
export interface GradePreset {
  id: string;
  /** Designation shown to learners, e.g. "AISI 440C". */
  label: string;
  /** Other standard designations ([Mem] cross-references). */
  alsoKnownAs: string[];
  family: "carbon" | "low-alloy" | "tool" | "high-speed" | "stainless" | "powder-tool";
  /** One plain sentence on what the grade is, in our own words. */
  description: string;
  composition: Composition;
}

export const GRADE_PRESETS: readonly GradePreset[] = [
  {
    id: "1095",
    label: "SAE 1095",
    alsoKnownAs: ["UNS G10950"],
    family: "carbon",
    description: "Plain high-carbon steel (about 0.95 % C): iron carbide only, easy to forge and to sharpen.",
    composition: { C: 0.95, Mn: 0.4 },
  },
  {
    id: "1080",
    label: "SAE 1080",
    alsoKnownAs: ["UNS G10800"],
    family: "carbon",
    description: "Eutectoid plain-carbon steel, a forgiving first steel for forging and heat treating.",
    composition: { C: 0.8, Mn: 0.75, Si: 0.25 },
  },
  {
    id: "5160",
    label: "SAE 5160",
    alsoKnownAs: ["UNS G51600"],
    family: "low-alloy",
    description: "Chromium spring steel: tough, used for long blades that must bend rather than break.",
    composition: { C: 0.6, Mn: 0.875, Si: 0.25, Cr: 0.8 },
  },
  {
    id: "52100",
    label: "SAE 52100",
    alsoKnownAs: ["UNS G52986", "EN 1.3505 (100Cr6)"],
    family: "low-alloy",
    description: "Bearing steel with about 1 % C and 1.5 % Cr: fine chromium-enriched cementite.",
    composition: { C: 1.0, Cr: 1.45, Mn: 0.35, Si: 0.25 },
  },
  {
    id: "O1",
    label: "AISI O1",
    alsoKnownAs: ["UNS T31501", "EN 1.2510 (100MnCrW4)"],
    family: "tool",
    description: "Oil-hardening cold-work tool steel with manganese, chromium and a little tungsten.",
    composition: { C: 0.95, Mn: 1.2, Cr: 0.5, W: 0.5, V: 0.2, Si: 0.3 },
  },
  {
    id: "L6",
    label: "AISI L6",
    alsoKnownAs: ["UNS T61206"],
    family: "tool",
    description: "Nickel-bearing tool steel, tough; a bright layer in pattern-welded billets.",
    composition: { C: 0.7, Mn: 0.55, Cr: 0.8, Ni: 1.5, Mo: 0.25, Si: 0.25 },
  },
  {
    id: "420",
    label: "AISI 420",
    alsoKnownAs: ["UNS S42000"],
    family: "stainless",
    description: "Hardenable 13 % Cr stainless with modest carbon: very corrosion resistant, modest edge life.",
    composition: { C: 0.3, Cr: 13.0, Mn: 0.5, Si: 0.5 },
  },
  {
    id: "440C",
    label: "AISI 440C",
    alsoKnownAs: ["UNS S44004", "EN 1.4125 (X105CrMo17)"],
    family: "stainless",
    description: "High-carbon 17 % Cr stainless: many chromium carbides, hard, less free chromium.",
    composition: { C: 1.075, Cr: 17.0, Mo: 0.5, Mn: 0.5, Si: 0.5 },
  },
  {
    id: "D2",
    label: "AISI D2",
    alsoKnownAs: ["UNS T30402", "EN 1.2379 (X153CrMoV12)"],
    family: "tool",
    description: "12 % Cr cold-work tool steel: large chromium carbides, wear resistant, not quite stainless.",
    composition: { C: 1.55, Cr: 11.5, Mo: 0.8, V: 0.9, Mn: 0.35, Si: 0.35 },
  },
  {
    id: "M2",
    label: "AISI M2",
    alsoKnownAs: ["UNS T11302", "EN 1.3343 (HS6-5-2C)"],
    family: "high-speed",
    description: "Tungsten–molybdenum high-speed steel: M6C and MC carbides that keep hardness when hot.",
    composition: { C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9, Mn: 0.3, Si: 0.3 },
  },
  {
    id: "A11",
    label: "AISI A11",
    alsoKnownAs: ["UNS T30111"],
    family: "powder-tool",
    description: "High-vanadium cold-work steel made by the powder route: a dense population of hard vanadium carbides.",
    composition: { C: 2.45, Cr: 5.25, Mo: 1.3, V: 9.75, Mn: 0.5, Si: 0.9 },
  },
  {
    id: "304",
    label: "AISI 304",
    alsoKnownAs: ["UNS S30400"],
    family: "stainless",
    description: "Austenitic 18 % Cr, 8 % Ni stainless: the kitchen-sink reference, not hardenable by quenching.",
    composition: { C: 0.05, Cr: 19.0, Ni: 9.0, Mn: 1.5, Si: 0.5, N: 0.05 },
  },
  {
    id: "316",
    label: "AISI 316",
    alsoKnownAs: ["UNS S31600"],
    family: "stainless",
    description: "Austenitic stainless with molybdenum for better pitting resistance in salt water.",
    composition: { C: 0.05, Cr: 17.0, Ni: 12.0, Mo: 2.5, Mn: 1.5, Si: 0.5, N: 0.05 },
  },
];

export function findGrade(id: string): GradePreset | undefined {
  return GRADE_PRESETS.find((g) => g.id === id);
}
