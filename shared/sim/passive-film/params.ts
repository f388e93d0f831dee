import { z } from "zod";

/**
 * Parameters of the passive-film simulation. The names are a contract with the lesson writers
 * (content/AUTHORING.md): a lesson opens the simulation with `preset={{ crMassPct: 9 }}` and this
 * schema fills in the rest. Unknown keys are rejected so a typo in a lesson fails the content check.
 * `lattice` is an extension beyond AUTHORING.md: the two competing model choices of science-reference §1a.
 */
export const passiveFilmParamsSchema = z
  .object({
    /** Chromium in the alloy, mass %. */
    crMassPct: z.number().min(0).max(30).default(13),
    /** Carbon in the alloy, mass %; it binds chromium into carbide particles. */
    cMassPct: z.number().min(0).max(1.2).default(0.05),
    /** Chromium carbide that forms from the carbon. */
    carbide: z.enum(["M23C6", "M7C3"]).default("M23C6"),
    /** 1 = first neighbours connect Cr sites; 2 = first and second neighbours. */
    neighbours: z.union([z.literal(1), z.literal(2)]).default(2),
    /** Crystal lattice of the Cr–Fe sites: body-centred cubic (real ferritic/martensitic steel) or simple cubic (the alternative model). */
    lattice: z.enum(["bcc", "sc"]).default("bcc"),
    /** "bulk": the network may run through a deep slab; "thin-layer": only through the few layers dissolved before passivation. */
    connectivity: z.enum(["bulk", "thin-layer"]).default("bulk"),
    environment: z.enum(["dry", "humid", "salt"]).default("humid"),
    seed: z.number().int().min(0).max(2 ** 31 - 1).default(7),
    view: z.enum(["surface", "spanning"]).default("surface"),
  })
  .strict();

export type PassiveFilmParams = z.output<typeof passiveFilmParamsSchema>;
export type PassiveFilmParamsInput = z.input<typeof passiveFilmParamsSchema>;

/** Defaults of every parameter. */
export const PASSIVE_FILM_DEFAULTS: PassiveFilmParams = passiveFilmParamsSchema.parse({});

/** Validates a (partial) preset and fills defaults; throws a ZodError for a preset the simulation rejects. */
export function parsePassiveFilmParams(input: unknown): PassiveFilmParams {
  return passiveFilmParamsSchema.parse(input ?? {});
}
