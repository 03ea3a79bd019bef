import { Router } from "express";
import { apiRoutes } from "../../../shared/schemas/api-paths";
import { forgotPasswordSchema, loginSchema, registerSchema, resetPasswordSchema } from "../../../shared/schemas/auth";
import { validate } from "../../lib/validate";
import type { AuthService } from "./auth.service";
import { signIn, signOut } from "./session";

const paths = apiRoutes.auth;

export function createAuthRouter(auth: AuthService): Router {
  const router = Router();

  router.post(paths.register, validate({ body: registerSchema }), async (req, res) => {
    const user = await auth.register(req.body);
    await signIn(req, user.id);
    res.status(201).json(user);
  });

  router.post(paths.login, validate({ body: loginSchema }), async (req, res) => {
    const user = await auth.login(req.body, req.ip ?? "unknown");
    await signIn(req, user.id);
    res.json(user);
  });

  router.post(paths.logout, async (req, res) => {
    await signOut(req, res);
    res.status(204).end();
  });

  router.get(paths.me, async (req, res) => {
    res.json(await auth.me(req.actor));
  });

  router.post(paths.forgot, validate({ body: forgotPasswordSchema }), async (req, res) => {
    await auth.forgot(req.body, req.ip ?? "unknown");
    res.status(202).json({ ok: true });
  });

  router.post(paths.reset, validate({ body: resetPasswordSchema }), async (req, res) => {
    await auth.reset(req.body);
    res.json({ ok: true });
  });

  return router;
}
