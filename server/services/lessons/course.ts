/**
 * The one course catalog of this process, loaded on first use and cached.
 * GRAIN_EDGE_CONTENT_DIR points the server at another course directory (the API
 * tests use a small fixture course); by default it is the repository's content/.
 */
import path from "node:path";
import { PROJECT_ROOT } from "../../config";
import { loadCourseCatalog, type CourseCatalog } from "./catalog";

const catalogs = new Map<string, Promise<CourseCatalog>>();

export function contentDir(): string {
  const override = process.env.GRAIN_EDGE_CONTENT_DIR;
  return override ? path.resolve(PROJECT_ROOT, override) : path.join(PROJECT_ROOT, "content");
}

export function getCourseCatalog(dir: string = contentDir()): Promise<CourseCatalog> {
  let catalog = catalogs.get(dir);
  if (!catalog) {
    catalog = loadCourseCatalog(dir);
    // A failed load (e.g. a syntax error in a quiz file) must not stay cached forever.
    catalog.catch(() => catalogs.delete(dir));
    catalogs.set(dir, catalog);
  }
  return catalog;
}
