import type { PublicUser } from "../shared/api/auth";

declare global {
  namespace Express {
    /** What passport's deserializeUser puts on req.user: re-read from the DB on every request. */
    interface User extends PublicUser {}
  }
}

declare module "express-session" {
  interface SessionData {
    /** Epoch ms of sign-in; enforces the absolute session timeout. */
    signedInAt?: number;
    passport?: { user?: number };
  }
}

export {};
