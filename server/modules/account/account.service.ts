import type { Preferences } from "../../../shared/schemas/account";
import type { Db } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { UnauthenticatedError } from "../../lib/errors";
import * as repo from "./account.repo";

type Reader = Actor | null | undefined;

/** The signed-in account's own preferences (today: the "map finished" e-mail). */
export class AccountService {
  constructor(private readonly deps: { db: Db }) {}

  async preferences(actor: Reader): Promise<Preferences> {
    const me = requireActor(actor);
    const row = await repo.findPreferences(this.deps.db, me.id);
    if (!row) throw new UnauthenticatedError();
    return row;
  }

  async updatePreferences(actor: Reader, patch: Partial<Preferences>): Promise<Preferences> {
    const me = requireActor(actor);
    await repo.updatePreferences(this.deps.db, me.id, patch);
    return this.preferences(me);
  }
}

export function createAccountService(deps: { db: Db }): AccountService {
  return new AccountService(deps);
}
