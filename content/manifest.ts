/**
 * The Grain & Edge course: modules in teaching order, each with its lessons in order.
 * A lesson slug names the file `content/<module-slug>/<lesson-slug>.mdx`; the server seeds
 * the modules from this list, so slugs are stable identifiers (do not rename them lightly).
 */
export interface ModuleEntry {
  slug: string;
  title: string;
  summary: string;
  lessons: string[];
}

export const MODULES: ModuleEntry[] = [
  {
    slug: "iron-carbon-hardness",
    title: "Iron, carbon and hardness",
    summary:
      "How iron changes its crystal with temperature, where carbon goes, and how quenching and tempering turn a soft bar into a hard, tough blade.",
    lessons: ["iron-and-carbon", "hardening-and-tempering"],
  },
  {
    slug: "why-stainless",
    title: "Why stainless resists rust",
    summary:
      "A chromium-rich oxide film a few atoms thick, the chromium it needs, the carbon that steals chromium, and how to rank steels for pitting.",
    lessons: ["the-passive-film", "carbon-chromium-and-pitting"],
  },
  {
    slug: "carbides-and-the-edge",
    title: "Carbides and the edge",
    summary:
      "Which carbides form, how hard they are, why they keep an edge and slow the stone, and what they cost in toughness.",
    lessons: ["carbides-and-abrasives", "tool-steels-and-toughness"],
  },
  {
    slug: "melt-to-ingot",
    title: "From melt to ingot",
    summary:
      "Freezing over a range of temperatures, solute pushed into the last liquid, dendrites and the segregation that limits how much vanadium an ingot can carry.",
    lessons: ["freezing-and-segregation"],
  },
  {
    slug: "powder-route",
    title: "The powder route",
    summary:
      "Breaking the melt into droplets that freeze in milliseconds, pressing the powder to full density, and what fine carbides cost at the grinder.",
    lessons: ["atomise-and-press"],
  },
  {
    slug: "choosing-and-treating",
    title: "Choosing and treating a steel for the job",
    summary:
      "Kitchen, outdoor and long blades, pattern-welded billets, reading a composition and planning a heat treatment step by step.",
    lessons: ["steel-for-the-job"],
  },
];
