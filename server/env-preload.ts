/**
 * Imported first by server/index.ts. argon2 and sqlite3 both run on libuv's thread pool (4
 * threads by default); give it 8 so hashing cannot starve database queries. Must be set before
 * the pool starts, i.e. before the first hash or query.
 */
process.env.UV_THREADPOOL_SIZE ??= "8";
export {};
