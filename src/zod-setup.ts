/**
 * Imported first by main.tsx, before any module builds a zod schema: zod's JIT probes
 * `new Function`, which the Content-Security-Policy forbids (script-src 'self', no eval), and
 * each object schema decides whether to use the JIT when it is constructed.
 */
import { config } from "zod";

config({ jitless: true });
