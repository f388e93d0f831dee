import helmet from "helmet";
import type { RequestHandler } from "express";

/**
 * helmet with a CSP the Vite build satisfies (no inline scripts; KaTeX, konva and recharts set
 * inline styles, hence style-src 'unsafe-inline'; workers may come from blob: URLs).
 * `secure` = the site is served over HTTPS: adds HSTS and upgrade-insecure-requests (which would
 * break a plain-http deployment, so they are off otherwise).
 */
export function securityHeaders(secure: boolean): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        "default-src": ["'self'"],
        "script-src": ["'self'"],
        "script-src-attr": ["'none'"],
        "style-src": ["'self'", "'unsafe-inline'"],
        "img-src": ["'self'", "data:", "blob:"],
        "font-src": ["'self'", "data:"],
        "worker-src": ["'self'", "blob:"],
        "connect-src": ["'self'"],
        "object-src": ["'none'"],
        "base-uri": ["'none'"],
        "frame-ancestors": ["'none'"],
        "form-action": ["'self'"],
        ...(secure ? { "upgrade-insecure-requests": [] } : {}),
      },
    },
    strictTransportSecurity: secure ? { maxAge: 31_536_000, includeSubDomains: true } : false,
    xFrameOptions: { action: "deny" },
    referrerPolicy: { policy: "no-referrer" },
  });
}
