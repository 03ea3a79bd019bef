import type { Request, RequestHandler, Response } from "express";
import "express-session";
import type { AuthService } from "./auth.service";

export const SESSION_COOKIE = "eq.sid";

/** Signs `userId` in on a fresh session id (defeats session fixation), saved before answering. */
export async function signIn(req: Pick<Request, "session">, userId: string): Promise<void> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
  req.session.userId = userId;
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
}

/** Destroys the session row and clears the cookie. */
export async function signOut(req: Pick<Request, "session">, res: Response): Promise<void> {
  await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
  res.clearCookie(SESSION_COOKIE, { path: "/", httpOnly: true, sameSite: "lax" });
}

/** Puts the signed-in account on req.actor (null when signed out or the account is gone). */
export function loadActor(auth: AuthService): RequestHandler {
  return async (req, _res, next) => {
    const userId = req.session?.userId;
    req.actor = userId ? await auth.findActor(userId) : null;
    next();
  };
}
