import { and, eq } from "drizzle-orm";
import { createMapSchema, type CreateMap } from "../../../shared/schemas/maps";
import type { MapsService } from "../../modules/maps/maps.service";
import type { Db } from "../client";
import { groups, maps, users } from "../schema/index";
import { DEMO_GROUP, demoPeople } from "./demo-lab";

/**
 * One small prepared map per ensemble for the demo lab, owned by the lab head, readable by the
 * lab's group and by a read-only link (for a class). They are created through the maps service,
 * so their jobs are queued like any map's; the worker started with the server computes them in
 * the background (about 7 s of CPU for the rate map and 70 s for the field map on one core of
 * the development machine, measured by running runCell over every cell on 2026-12-01).
 */
export const demoMapBodies: CreateMap[] = [
  createMapSchema.parse({
    title: "Leak against asymmetry — rate network, N = 20 (demo)",
    description:
      "How many stable states does a random rate network settle into as the leak μ grows and the couplings go from symmetric (τ = 1) to unrelated (τ = 0)? Six networks per cell, 24 random starts each. Counts are the distinct stable equilibria found: lower bounds of the true numbers.",
    ensemble: "rate",
    settings: { N: 20, g: 1, nonlinearity: "tanh", input: 0 },
    mu: { min: 0.4, max: 2, steps: 6, scale: "linear" },
    tau: { min: 0, max: 1, steps: 5, scale: "linear" },
    budget: { networks: 6, starts: 24, tMax: 100 },
    seed: 20261201,
    visibility: "link",
  }),
  createMapSchema.parse({
    title: "Gradient share and relaxation — field network, N = 8 (demo)",
    description:
      "The Gaussian field network around its critical relaxation rate μ_c = σ√N ≈ 2.83: found stable equilibria beside the finite-N Kac–Rice expectation and the large-N complexity (asymptotic). Six networks per cell, 24 starts each.",
    ensemble: "field",
    settings: { N: 8, sigma: 1 },
    mu: { min: 2, max: 6, steps: 6, scale: "linear" },
    tau: { min: 0.2, max: 1, steps: 5, scale: "linear" },
    budget: { networks: 6, starts: 24, tMax: 100 },
    seed: 20261202,
    visibility: "link",
  }),
];

export interface SeededMap {
  title: string;
  id: string;
  created: boolean;
  shareToken: string | null;
}

/**
 * Creates the demo maps that do not exist yet (matched by owner and title), so it can run on
 * every start; existing ones are left as they are, whatever their state.
 * @param db the database (the demo lab must be seeded: seedDemoLab)
 * @param mapsService the maps service on a started queue
 * @throws Error when the demo lab's head or group is missing
 */
export async function seedDemoMaps(db: Db, mapsService: MapsService): Promise<SeededMap[]> {
  const head = demoPeople[0];
  const [owner] = await db.select({ id: users.id, email: users.email, name: users.name, siteRole: users.siteRole }).from(users).where(eq(users.email, head.email));
  if (!owner) throw new Error(`seed the demo lab first: ${head.email} is missing`);
  const [group] = await db.select({ id: groups.id }).from(groups).where(and(eq(groups.name, DEMO_GROUP), eq(groups.createdBy, owner.id)));
  if (!group) throw new Error(`seed the demo lab first: group "${DEMO_GROUP}" is missing`);
  const out: SeededMap[] = [];
  for (const body of demoMapBodies) {
    const [existing] = await db.select({ id: maps.id, shareToken: maps.shareToken }).from(maps).where(and(eq(maps.ownerId, owner.id), eq(maps.title, body.title)));
    if (existing) {
      out.push({ title: body.title, id: existing.id, created: false, shareToken: existing.shareToken });
      continue;
    }
    const answer = await mapsService.create(owner, { ...body, groupId: group.id });
    if (!("id" in answer)) throw new Error(`demo map "${body.title}" was not created`);
    const link = await mapsService.share(owner, answer.id);
    out.push({ title: body.title, id: answer.id, created: true, shareToken: link.token });
  }
  return out;
}
