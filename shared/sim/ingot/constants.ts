/** Names the ingot simulation uses everywhere; kept apart from params.ts so the worker needs no zod. */
export const INGOT_ELEMENTS = ["C", "Cr", "V", "Mo", "Mn", "Si"] as const;
export type IngotElement = (typeof INGOT_ELEMENTS)[number];

export const MOULDS = ["sand", "metal", "water-cooled"] as const;
export type Mould = (typeof MOULDS)[number];
