import type { ForgotPassword, Login, Register, ResetPassword, User } from "../../../shared/schemas/auth";
import { pagePaths } from "../../../shared/schemas/api-paths";
import type { Db } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { iso } from "../../lib/dto";
import { ConflictError, InvalidError, RateLimitedError, UnauthenticatedError } from "../../lib/errors";
import type { Logger } from "../../lib/logger";
import { hashPassword, verifyPassword } from "../../lib/passwords";
import { hashToken, newToken } from "../../lib/tokens";
import type { Mailer } from "../../mail/mailer";
import { resetPasswordMail } from "../../mail/templates";
import * as repo from "./auth.repo";
import { clearRateLimit, hitRateLimit, pruneRateLimits } from "./rate-limit.repo";

export interface RateRule {
  max: number;
  windowMs: number;
}

/** Sign-in and reset limits. Defaults: 10 sign-ins per account and 100 per address per 15 min; 5 reset requests per account and 20 per address per hour. */
export interface AuthLimits {
  loginPerAccount: RateRule;
  loginPerAddress: RateRule;
  forgotPerAccount: RateRule;
  forgotPerAddress: RateRule;
}

export const defaultAuthLimits: AuthLimits = {
  loginPerAccount: { max: 10, windowMs: 15 * 60_000 },
  loginPerAddress: { max: 100, windowMs: 15 * 60_000 },
  forgotPerAccount: { max: 5, windowMs: 60 * 60_000 },
  forgotPerAddress: { max: 20, windowMs: 60 * 60_000 },
};

export const RESET_TOKEN_TTL_MS = 60 * 60_000;
const WRONG_CREDENTIALS = "E-mail or password is wrong";

export interface AuthServiceDeps {
  db: Db;
  mailer: Mailer;
  appUrl: string;
  logger: Logger;
  limits?: Partial<AuthLimits>;
}

export function toUser(row: repo.UserRow): User {
  return { id: row.id, email: row.email, name: row.name, siteRole: row.siteRole, createdAt: iso(row.createdAt) };
}

const TOO_MANY_SIGN_INS = "Too many sign-in attempts; try again later";
const TOO_MANY_RESETS = "Too many reset requests; try again later";

/** Accounts, sign-in, password reset. Rules live here; sessions are the router's business. */
export class AuthService {
  private readonly db: Db;
  private readonly limits: AuthLimits;

  constructor(private readonly deps: AuthServiceDeps) {
    this.db = deps.db;
    this.limits = { ...defaultAuthLimits, ...deps.limits };
  }

  private async enforce(key: string, rule: RateRule, message: string): Promise<void> {
    const { hits, resetAt } = await hitRateLimit(this.db, key, rule.windowMs);
    if (hits > rule.max) {
      throw new RateLimitedError(message, Math.max(1, Math.ceil((resetAt.getTime() - Date.now()) / 1000)));
    }
  }

  /** Creates an account (site role member). Throws ConflictError when the e-mail is taken. */
  async register(input: Register): Promise<User> {
    const passwordHash = await hashPassword(input.password);
    const row = await repo.insertUser(this.db, { email: input.email, name: input.name, passwordHash });
    if (!row) {
      const message = "An account with this e-mail already exists";
      throw new ConflictError(message, [{ path: "email", message }]);
    }
    return toUser(row);
  }

  /** Checks credentials under per-address and per-account limits; the same 401 for a wrong e-mail or password. */
  async login(input: Login, address: string): Promise<User> {
    await this.enforce(`login:address:${address}`, this.limits.loginPerAddress, TOO_MANY_SIGN_INS);
    await this.enforce(`login:account:${input.email}`, this.limits.loginPerAccount, TOO_MANY_SIGN_INS);
    const row = await repo.findUserByEmail(this.db, input.email);
    const ok = await verifyPassword(row?.passwordHash ?? null, input.password);
    if (!row || !ok) throw new UnauthenticatedError(WRONG_CREDENTIALS);
    await clearRateLimit(this.db, `login:account:${input.email}`);
    return toUser(row);
  }

  /** The signed-in account. */
  async me(actor: Actor | null | undefined): Promise<User> {
    const row = await repo.findUserById(this.db, requireActor(actor).id);
    if (!row) throw new UnauthenticatedError();
    return toUser(row);
  }

  /** Loads the actor of a session; null when the account no longer exists. */
  async findActor(userId: string): Promise<Actor | null> {
    const row = await repo.findUserById(this.db, userId);
    return row ? { id: row.id, email: row.email, name: row.name, siteRole: row.siteRole } : null;
  }

  /** Drops rate-limit counters whose window has ended (run periodically by the app). */
  pruneRateLimits(): Promise<number> {
    return pruneRateLimits(this.db);
  }

  /** E-mails a one-hour reset link when the account exists; answers the same either way. */
  async forgot(input: ForgotPassword, address: string): Promise<void> {
    await this.enforce(`forgot:address:${address}`, this.limits.forgotPerAddress, TOO_MANY_RESETS);
    await this.enforce(`forgot:account:${input.email}`, this.limits.forgotPerAccount, TOO_MANY_RESETS);
    const user = await repo.findUserByEmail(this.db, input.email);
    if (!user) return;
    const { token, hash } = newToken();
    await repo.insertResetToken(this.db, { userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS) });
    try {
      await this.deps.mailer.send(resetPasswordMail(user, `${this.deps.appUrl}${pagePaths.reset(token)}`));
    } catch (err) {
      // The answer must not depend on the account existing, so a mail failure is logged only.
      this.deps.logger.error("reset e-mail could not be sent", { message: (err as Error).message });
    }
  }

  /** Sets a new password with a valid, unused, unexpired token; signs the account out everywhere. */
  async reset(input: ResetPassword): Promise<void> {
    const passwordHash = await hashPassword(input.password);
    await this.db.transaction(async (tx) => {
      const row = await repo.findResetTokenForUpdate(tx, hashToken(input.token));
      if (!row || row.usedAt !== null || row.expiresAt.getTime() <= Date.now()) {
        const message = "This reset link is invalid, used or expired; ask for a new one";
        throw new InvalidError(message, [{ path: "token", message }]);
      }
      await repo.updatePasswordHash(tx, row.userId, passwordHash);
      await repo.useResetTokensOf(tx, row.userId);
      await repo.deleteSessionsOf(tx, row.userId);
    });
  }
}

export function createAuthService(deps: AuthServiceDeps): AuthService {
  return new AuthService(deps);
}
