import { z } from "zod";
import { cellSummarySchema } from "../maps/cell-summary";
import { layerIds } from "../maps/layers";
import { cellResultSchema } from "./cell-result";
import { idSchema, timestampSchema } from "./common";
import { theoryColumnsSchema } from "./theory";

/**
 * Maps: sweeps over (μ, τ). The create body is the map's manifest; everything that determines a
 * cell (ensemble, settings, budget, seed, the cell's μ and τ) is hashed into the cell key, so
 * any map of any account that needs the same cell reuses the stored result.
 */

export const axisScaleSchema = z.enum(["linear", "log"]);

const axisBase = z.object({
  min: z.number().finite(),
  max: z.number().finite(),
  steps: z.number().int().min(1, "At least 1 step").max(64, "At most 64 steps (grid limit 64 × 64)"),
  scale: axisScaleSchema.default("linear"),
});

function axisRules(a: { min: number; max: number; steps: number; scale: string }, ctx: z.RefinementCtx) {
  if (a.max < a.min) ctx.addIssue({ code: "custom", path: ["max"], message: "max must be at least min" });
  if (a.steps === 1 && a.max !== a.min) ctx.addIssue({ code: "custom", path: ["steps"], message: "One step needs min = max" });
  if (a.scale === "log" && a.min <= 0) ctx.addIssue({ code: "custom", path: ["min"], message: "A log axis needs min > 0" });
}

/** μ axis: relaxation rates, all > 0. */
export const muAxisSchema = axisBase
  .extend({ min: z.number().finite().positive("μ must be > 0"), max: z.number().finite().positive("μ must be > 0").max(1e4) })
  .superRefine(axisRules);
export type MuAxis = z.infer<typeof muAxisSchema>;

/** τ axis: asymmetry in [0, 1]. */
export const tauAxisSchema = axisBase
  .extend({ min: z.number().min(0, "τ must be in [0, 1]").max(1, "τ must be in [0, 1]"), max: z.number().min(0, "τ must be in [0, 1]").max(1, "τ must be in [0, 1]") })
  .superRefine(axisRules);
export type TauAxis = z.infer<typeof tauAxisSchema>;

/** Points of an axis, lowest first (linear or geometric spacing). */
export function axisPoints(a: { min: number; max: number; steps: number; scale?: "linear" | "log" }): number[] {
  if (a.steps === 1) return [a.min];
  const out: number[] = [];
  for (let i = 0; i < a.steps; i++) {
    const u = i / (a.steps - 1);
    out.push(a.scale === "log" ? a.min * Math.pow(a.max / a.min, u) : a.min + (a.max - a.min) * u);
  }
  out[a.steps - 1] = a.max;
  return out;
}

export const nonlinearitySchema = z.enum(["tanh"]);

export const rateSettingsSchema = z.object({
  N: z.number().int().min(1).max(500, "N at most 500"),
  g: z.number().positive("g must be > 0").max(20),
  nonlinearity: nonlinearitySchema.default("tanh"),
  input: z.number().finite().min(-10).max(10).default(0),
});
export type RateSettings = z.infer<typeof rateSettingsSchema>;

export const fieldSettingsSchema = z.object({
  N: z.number().int().min(1).max(200, "N at most 200 for the field network"),
  sigma: z.number().positive("σ must be > 0").max(100).default(1),
  /** Random Fourier features M (default 40·N when omitted). */
  features: z.number().int().min(1).max(20000).optional(),
  lengthScale: z.number().positive().max(100).default(1),
});
export type FieldSettings = z.infer<typeof fieldSettingsSchema>;

export const budgetSchema = z.object({
  networks: z.number().int().min(1, "At least 1 network").max(64, "At most 64 networks per cell"),
  starts: z.number().int().min(1, "At least 1 start").max(256, "At most 256 starts per network"),
  tMax: z.number().positive().max(5000).default(200),
  rtol: z.number().min(1e-12).max(1e-2).default(1e-6),
  atol: z.number().min(1e-14).max(1e-2).default(1e-9),
  /** Newton with deflation from many starts for unstable equilibria too (N ≤ 10). */
  exhaustive: z.boolean().default(false),
});
export type Budget = z.infer<typeof budgetSchema>;

export const visibilitySchema = z.enum(["private", "group", "link"]);
export type Visibility = z.infer<typeof visibilitySchema>;

const common = {
  title: z.string().trim().min(1, "Give the map a title").max(120),
  description: z.string().trim().max(2000).default(""),
  mu: muAxisSchema,
  tau: tauAxisSchema,
  budget: budgetSchema,
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
  visibility: visibilitySchema.default("private"),
  groupId: idSchema.nullable().optional(),
  estimateOnly: z.boolean().optional(),
};

/** POST /api/maps body (also the manifest embedded in exports). */
export const createMapSchema = z
  .discriminatedUnion("ensemble", [
    z.object({ ensemble: z.literal("rate"), settings: rateSettingsSchema, ...common }),
    z.object({ ensemble: z.literal("field"), settings: fieldSettingsSchema, ...common }),
  ])
  .superRefine((m, ctx) => {
    if (m.visibility === "group" && !m.groupId) ctx.addIssue({ code: "custom", path: ["groupId"], message: "Choose a group for group visibility" });
    if (m.budget.exhaustive && m.settings.N > 10) ctx.addIssue({ code: "custom", path: ["budget", "exhaustive"], message: "Exhaustive search is limited to N ≤ 10" });
  });
export type CreateMap = z.infer<typeof createMapSchema>;
export type MapEnsemble = CreateMap["ensemble"];

export const updateMapSchema = z
  .object({
    title: common.title.optional(),
    description: z.string().trim().max(2000).optional(),
    visibility: visibilitySchema.optional(),
    groupId: idSchema.nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Nothing to update" });
export type UpdateMap = z.infer<typeof updateMapSchema>;

export const mapStatusSchema = z.enum(["queued", "running", "done", "cancelled", "failed"]);
export type MapStatus = z.infer<typeof mapStatusSchema>;

/** Answer to `estimateOnly: true` (and part of the create answer). */
export const mapEstimateSchema = z.object({
  cells: z.number().int(),
  cachedCells: z.number().int(),
  estimatedSeconds: z.number().nonnegative(),
});
export type MapEstimate = z.infer<typeof mapEstimateSchema>;

/** What the signed-in (or link) reader may do with a map. */
export const mapAccessSchema = z.enum(["owner", "editor", "viewer", "link"]);

export const mapSchema = z.object({
  id: idSchema,
  title: z.string(),
  description: z.string(),
  ownerId: idSchema,
  ownerName: z.string(),
  groupId: idSchema.nullable(),
  groupName: z.string().nullable(),
  visibility: visibilitySchema,
  /** Present for owner and editors while a read-only link exists. */
  shareToken: z.string().nullable(),
  access: mapAccessSchema,
  ensemble: z.enum(["rate", "field"]),
  ensembleVersion: z.string(),
  settings: z.record(z.string(), z.unknown()),
  mu: z.object({ min: z.number(), max: z.number(), steps: z.number(), scale: axisScaleSchema }),
  tau: z.object({ min: z.number(), max: z.number(), steps: z.number(), scale: axisScaleSchema }),
  budget: budgetSchema,
  seed: z.number().int(),
  muCritical: z.number().nullable(),
  status: mapStatusSchema,
  failure: z.string().nullable(),
  cellsTotal: z.number().int(),
  cellsDone: z.number().int(),
  cellsComputed: z.number().int(),
  cellsFromCache: z.number().int(),
  /** Cells per minute over the last minutes of computing, null before any. */
  throughput: z.number().nullable(),
  etaSeconds: z.number().nullable(),
  replicateOf: idSchema.nullable(),
  createdAt: timestampSchema,
  startedAt: timestampSchema.nullable(),
  finishedAt: timestampSchema.nullable(),
});
export type MapView = z.infer<typeof mapSchema>;

export const mapListQuerySchema = z.object({
  scope: z.enum(["mine", "group", "shared", "all"]).default("all"),
  q: z.string().trim().max(200).optional(),
  sort: z.enum(["newest", "oldest", "title"]).default("newest"),
});
export const mapListSchema = z.object({ items: z.array(mapSchema) });

export const cellParamsSchema = z.object({
  id: idSchema,
  i: z.coerce.number().int().min(0).max(63),
  j: z.coerce.number().int().min(0).max(63),
});

// ——— Read routes: queries and answers ———

/** `?share=TOKEN`: every read route accepts a share link's token (read-only access). */
export const shareQuerySchema = z.object({ share: z.string().trim().min(1).max(100).optional() });
export type ShareQuery = z.infer<typeof shareQuerySchema>;

export const mapIdParamsSchema = z.object({ id: idSchema });
export const shareTokenParamsSchema = z.object({ token: z.string().trim().min(1).max(100) });

/** GET /api/maps/:id/grid?layer= */
export const gridQuerySchema = shareQuerySchema.extend({ layer: z.enum(layerIds).default("stable-found") });
export type GridQuery = z.infer<typeof gridQuerySchema>;

/** One layer of a map: values[j][i] (j along τ, i along μ), null where the cell has none. */
export const mapGridSchema = z.object({
  layer: z.enum(layerIds),
  mu: z.array(z.number()),
  tau: z.array(z.number()),
  values: z.array(z.array(z.number().nullable())),
  cells: z.array(cellSummarySchema),
});
export type MapGrid = z.infer<typeof mapGridSchema>;

/** GET /api/maps/:id/cells/:i/:j */
export const mapCellDetailSchema = z.object({
  summary: cellSummarySchema,
  /** The full engine result (null while the cell is not done). */
  result: cellResultSchema.nullable(),
  /** The τ row's theory columns at this μ (null until the row is computed). */
  theory: theoryColumnsSchema.nullable(),
  cellKey: z.string(),
  fromCache: z.boolean(),
});
export type MapCellDetail = z.infer<typeof mapCellDetailSchema>;

/** POST /api/maps answer: the estimate alone (estimateOnly) or the new map with it. */
export const createMapAnswerSchema = z.union([mapSchema.extend(mapEstimateSchema.shape), mapEstimateSchema]);

/** POST /api/maps/:id/share */
export const mapShareSchema = z.object({ token: z.string(), url: z.string() });
export type MapShare = z.infer<typeof mapShareSchema>;

/** GET /api/maps/:id/export.json */
export const mapExportSchema = z.object({
  manifest: z.record(z.string(), z.unknown()),
  engineVersion: z.string(),
  ensembleVersion: z.string(),
  exportedAt: timestampSchema,
  cells: z.array(cellSummarySchema.extend({ cellKey: z.string() })),
});
export type MapExport = z.infer<typeof mapExportSchema>;

/** GET /api/maps/:id/cells/:i/:j/networks/:k/couplings.(npy|csv): one network's coupling matrix. */
export const couplingsParamsSchema = cellParamsSchema.extend({
  k: z.coerce.number().int().min(0).max(63),
  format: z.enum(["npy", "csv"]),
});
