import "express-session";
import type { SiteRole } from "../../shared/schemas/auth";
import { UnauthenticatedError } from "./errors";

/** The signed-in account a request acts for, loaded fresh from the database per request. */
export interface Actor {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
}

declare module "express-session" {
  interface SessionData {
    userId?: string;
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set by the session middleware: the signed-in account, or null. */
      actor?: Actor | null;
    }
  }
}

/** Returns the actor, or throws UnauthenticatedError when nobody is signed in. */
export function requireActor(actor: Actor | null | undefined): Actor {
  if (!actor) throw new UnauthenticatedError();
  return actor;
}
