/**
 * Saved alloys: named compositions a signed-in user keeps from the alloy explorer, and the
 * alloys an instructor attaches to a lesson task. Request and response schemas shared by
 * the client hooks (src/api/alloys.ts) and the server route (server/routes/alloys.ts).
 */
import { z } from "zod";
import { ALLOY_ELEMENTS, ALLOY_NAME_MAX, type AlloyElement } from "../sim/alloy/params";
import { ELEMENT_RANGE_MASS_PCT } from "../sim/alloy/element-ranges";
import { lessonSlugSchema } from "./lessons";

const elementShape = Object.fromEntries(
  ALLOY_ELEMENTS.map((el) => [
    el,
    z
      .number({ error: `${el} must be a number of mass %.` })
      .min(ELEMENT_RANGE_MASS_PCT[el].min, `${el} must be at least ${ELEMENT_RANGE_MASS_PCT[el].min} %.`)
      .max(ELEMENT_RANGE_MASS_PCT[el].max, `${el} must be at most ${ELEMENT_RANGE_MASS_PCT[el].max} %.`)
      .optional(),
  ]),
) as Record<AlloyElement, z.ZodOptional<z.ZodNumber>>;

/** Mass percents of the explorer's nine elements; missing means zero, iron is the balance. */
export const alloyCompositionSchema = z.strictObject(elementShape);
export type AlloyComposition = z.infer<typeof alloyCompositionSchema>;

export const alloyNameSchema = z
  .string({ error: "Give the alloy a name." })
  .trim()
  .min(1, "Give the alloy a name.")
  .max(ALLOY_NAME_MAX, `Use at most ${ALLOY_NAME_MAX} characters.`);

export const createSavedAlloyRequestSchema = z.strictObject({
  name: alloyNameSchema,
  composition: alloyCompositionSchema,
});
export type CreateSavedAlloyRequest = z.infer<typeof createSavedAlloyRequestSchema>;

export const renameSavedAlloyRequestSchema = z.strictObject({ name: alloyNameSchema });
export type RenameSavedAlloyRequest = z.infer<typeof renameSavedAlloyRequestSchema>;

export const alloyIdParamSchema = z.strictObject({
  id: z.coerce.number({ error: "The alloy id must be a number." }).int().positive("The alloy id must be a positive integer."),
});

export const attachAlloyRequestSchema = z.strictObject({
  lessonSlug: lessonSlugSchema,
  note: z.string().trim().max(500, "Use at most 500 characters.").default(""),
});
export type AttachAlloyRequest = z.input<typeof attachAlloyRequestSchema>;

export const detachAlloyParamsSchema = z.strictObject({
  id: alloyIdParamSchema.shape.id,
  slug: lessonSlugSchema,
});

export const savedAlloySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  composition: alloyCompositionSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SavedAlloy = z.infer<typeof savedAlloySchema>;

export interface SavedAlloyListResponse {
  alloys: SavedAlloy[];
}

export interface SavedAlloyResponse {
  alloy: SavedAlloy;
}

export const attachedAlloySchema = z.object({
  id: z.number().int(),
  lessonSlug: z.string(),
  note: z.string(),
  alloyId: z.number().int(),
  name: z.string(),
  composition: alloyCompositionSchema,
  attachedBy: z.string(),
  /** The viewer owns the alloy (and so may detach it). */
  yours: z.boolean(),
  createdAt: z.string(),
});
export type AttachedAlloy = z.infer<typeof attachedAlloySchema>;

export interface AttachedAlloyResponse {
  attachment: AttachedAlloy;
}

export interface AttachedAlloyListResponse {
  attachments: AttachedAlloy[];
}

/** At most this many saved alloys per user (keeps one account from filling the database). */
export const MAX_SAVED_ALLOYS_PER_USER = 200;
