import { z } from "zod";

/** GET /api/account/preferences: the signed-in account's own settings. */
export const preferencesSchema = z.object({
  /** E-mail the owner when one of their maps has finished filling. */
  notifyMapFinished: z.boolean(),
});
export type Preferences = z.infer<typeof preferencesSchema>;

/** PATCH /api/account/preferences: any subset, at least one field. */
export const updatePreferencesSchema = preferencesSchema.partial().refine((v) => Object.keys(v).length > 0, { message: "Nothing to update" });
export type UpdatePreferences = z.infer<typeof updatePreferencesSchema>;
