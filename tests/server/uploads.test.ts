/**
 * Notebook uploads (reliability guide §5(c), ASVS V5): the type is decided by content; every bad
 * upload gets a clear JSON error and leaves NOTHING behind (no row, no file in the uploads
 * directory); photos are re-encoded without metadata, with a thumbnail; files are served only to
 * the owner, the owner's instructors and admins, with nosniff, a sandboxing CSP and a safe
 * Content-Disposition; the per-user quota holds, also for uploads racing each other.
 * Every fixture is built here at test time (sharp for images, bytes by hand for the rest).
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";
import request from "supertest";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { NotebookFile, NotebookFileResponse } from "../../shared/api/notebook";
import { createTestApp, createUser, signIn, type TestApp } from "../support/test-app";
import { createTeachingWorld, type Signed, type TeachingWorld } from "./teaching-fixture";
import { newCouponEntry } from "./notebook-fixture";

const MIB = 1024 * 1024;
let w: TeachingWorld;
let uploadsDir: string;

beforeAll(async () => {
  w = await createTeachingWorld();
  uploadsDir = path.join(w.t.dir, "uploads");
});
afterAll(() => w?.t.cleanup());

// ---- fixtures ---------------------------------------------------------------------------------

const photo = (width = 640, height = 480) =>
  sharp({ create: { width, height, channels: 3, background: { r: 192, g: 138, b: 69 } } }).png().toBuffer();

/** A JPEG carrying EXIF with a camera make, an owner name and a GPS position. */
const jpegWithExif = () =>
  sharp({ create: { width: 800, height: 600, channels: 3, background: "#3e5fa6" } })
    .jpeg()
    .withExif({
      IFD0: { Make: "CinderfieldCam", Model: "Etch-9", Artist: "Ruth Kettleby", Copyright: "SECRET-OWNER-MARK" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 0/1" },
    })
    .toBuffer();

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typeAndData = Buffer.concat([Buffer.from(type, "latin1"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** A well-formed PNG whose IHDR (valid CRC) claims 20,000 × 20,000 RGB pixels: 400 megapixels. */
function hugePngHeader(): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(20_000, 0);
  ihdr.writeUInt32BE(20_000, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk("IHDR", ihdr),
    pngChunk("IDAT", zlib.deflateSync(Buffer.alloc(64))),
    pngChunk("IEND", Buffer.alloc(0)),
  ]);
}

const elf = () => Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(120)]);
const windowsExe = () => {
  const b = Buffer.alloc(256);
  b.write("MZ", 0, "latin1");
  b.writeUInt32LE(0x80, 0x3c);
  b.write("PE\0\0", 0x80, "latin1");
  return b;
};
const svgWithScript = () =>
  Buffer.from('<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(document.cookie)</script></svg>');
const html = () => Buffer.from("<!doctype html><html><body><script>fetch('/api/auth/me')</script></body></html>");

function pdf(extra = ""): Buffer {
  return Buffer.from(
    `%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R ${extra}>> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n`,
    "latin1",
  );
}

// ---- helpers ----------------------------------------------------------------------------------

const newEntry = (s: Signed, title = "Upload test coupon") => newCouponEntry(s, title);

function upload(s: Signed, entryId: number, data: Buffer, filename: string, contentType = "application/octet-stream") {
  return s.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", s.csrfToken).attach("file", data, { filename, contentType });
}

function listUploads(dir = uploadsDir): string[] {
  return fs.existsSync(dir) ? fs.readdirSync(dir).sort() : [];
}

async function fileRows(t: TestApp = w.t): Promise<number> {
  return t.db.read(() => t.db.models.NotebookFile.count());
}

/** Run a bad upload and check it left no row and no file behind. */
async function expectRejected(res: request.Response | Promise<request.Response>, status: number, code: string, before: { rows: number; files: string[] }) {
  const r = await res;
  expect({ status: r.status, code: r.body?.error?.code }, JSON.stringify(r.body)).toEqual({ status, code });
  expect(typeof r.body.error.message).toBe("string");
  expect(r.body.error.message.length).toBeGreaterThan(20);
  expect(JSON.stringify(r.body)).not.toMatch(/at .*\.ts:\d+|node_modules/); // no stack trace
  expect(await fileRows()).toBe(before.rows);
  expect(listUploads()).toEqual(before.files);
  return r;
}

const snapshot = async () => ({ rows: await fileRows(), files: listUploads() });

// ---- tests ------------------------------------------------------------------------------------

describe("bad uploads are refused and leave nothing behind", () => {
  let entryId: number;
  beforeAll(async () => {
    entryId = await newEntry(w.s1);
    // One good upload first, so the directory exists and "nothing changed" is a real comparison.
    expect((await upload(w.s1, entryId, await photo(), "first.png", "image/png")).status).toBe(201);
  });

  it("an ELF executable renamed .png", async () => {
    const r = await expectRejected(upload(w.s1, entryId, elf(), "grain.png", "image/png"), 415, "unsupported_file_type", await snapshot());
    expect(r.body.error.message).toMatch(/executables are not accepted/);
  });

  it("a Windows program (MZ header) renamed .jpg", async () => {
    await expectRejected(upload(w.s1, entryId, windowsExe(), "etch.jpg", "image/jpeg"), 415, "unsupported_file_type", await snapshot());
  });

  it("an SVG with a script, even when called image/svg+xml or .png", async () => {
    const r = await expectRejected(upload(w.s1, entryId, svgWithScript(), "edge.svg", "image/svg+xml"), 415, "unsupported_file_type", await snapshot());
    expect(r.body.error.message).toMatch(/SVG, HTML/);
    await expectRejected(upload(w.s1, entryId, svgWithScript(), "edge.png", "image/png"), 415, "unsupported_file_type", await snapshot());
  });

  it("an HTML file", async () => {
    await expectRejected(upload(w.s1, entryId, html(), "report.html", "text/html"), 415, "unsupported_file_type", await snapshot());
  });

  it("a file one byte over the 8 MiB limit gets 413; the limit itself is accepted by multer", async () => {
    // A JPEG start followed by filler: the size limit acts before any content check.
    const over = Buffer.alloc(8 * MIB + 1, 0x20);
    over[0] = 0xff;
    over[1] = 0xd8;
    over[2] = 0xff;
    const r = await expectRejected(upload(w.s1, entryId, over, "big.jpg", "image/jpeg"), 413, "payload_too_large", await snapshot());
    expect(r.body.error.message).toMatch(/8 MB/);
    // Exactly at the limit passes multer and fails later, on content: the limit is not off by one.
    await expectRejected(upload(w.s1, entryId, over.subarray(0, 8 * MIB), "big.jpg", "image/jpeg"), 422, "invalid_image", await snapshot());
  });

  it("too many parts", async () => {
    const before = await snapshot();
    let req = w.s1.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", w.s1.csrfToken);
    for (let i = 0; i < 12; i += 1) req = req.field(`note${i}`, "x");
    await expectRejected(req.attach("file", await photo(), "a.png"), 400, "too_many_parts", before);
  });

  it("two files in one upload, or a file under another field name", async () => {
    const png = await photo();
    const two = w.s1.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", w.s1.csrfToken).attach("file", png, "a.png").attach("file", png, "b.png");
    await expectRejected(two, 400, "too_many_files", await snapshot());
    const wrongField = w.s1.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", w.s1.csrfToken).attach("photo", png, "a.png");
    await expectRejected(wrongField, 400, "unexpected_field", await snapshot());
  });

  it("a PNG header claiming 20,000 × 20,000 pixels is refused before decoding", async () => {
    const r = await expectRejected(upload(w.s1, entryId, hugePngHeader(), "huge.png", "image/png"), 413, "image_too_large", await snapshot());
    expect(r.body.error.message).toMatch(/40 megapixels/);
  });

  it("a truncated photo and a PDF with JavaScript", async () => {
    const good = await photo();
    await expectRejected(upload(w.s1, entryId, good.subarray(0, 60), "cut.png", "image/png"), 422, "invalid_image", await snapshot());
    const r = await expectRejected(upload(w.s1, entryId, pdf("/OpenAction << /S /JavaScript /JS (app.alert(1)) >> "), "r.pdf", "application/pdf"), 422, "pdf_active_content", await snapshot());
    expect(r.body.error.message).toMatch(/plain PDF/);
  });

  it("a malformed multipart body, a JSON body, and a missing CSRF token", async () => {
    const before = await snapshot();
    const malformed = w.s1.agent
      .post(`/api/notebook/entries/${entryId}/files`)
      .set("x-csrf-token", w.s1.csrfToken)
      .set("Content-Type", "multipart/form-data; boundary=XyZ")
      .send('--XyZ\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\nContent-Type: image/png\r\n\r\n\x89PNG trunc');
    await expectRejected(malformed, 400, "malformed_upload", before);
    // Regression seeds (reliability guide §5(c)): the shapes of multer#1338 (empty file name, cut-off
    // closing boundary) and juice-shop#3641 (part header straight into the closing boundary).
    const raw = (boundary: string, body: string) =>
      w.s1.agent
        .post(`/api/notebook/entries/${entryId}/files`)
        .set("x-csrf-token", w.s1.csrfToken)
        .set("Content-Type", `multipart/form-data; boundary=${boundary}`)
        .send(body);
    for (const r of [
      await raw("----FormBoundary", '------FormBoundary\r\nContent-Disposition: form-data; name="file"; filename=""\r\nContent-Type: application/octet-stream\r\n\r\n\r\n------FormBoundar'),
      await raw("----geckoformboundary", '------geckoformboundary\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\nContent-Type: image/png\r\n\r\n------geckoformboundary--\r\n'),
    ]) {
      expect(r.status, JSON.stringify(r.body)).toBe(400);
      expect(["malformed_upload", "file_missing", "empty_file", "unsupported_file_type"]).toContain(r.body.error.code);
    }
    expect(await fileRows()).toBe(before.rows);
    expect(listUploads()).toEqual(before.files);
    await expectRejected(w.s1.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", w.s1.csrfToken).send({ file: "x" }), 400, "file_missing", before);
    const noToken = w.s1.agent.post(`/api/notebook/entries/${entryId}/files`).attach("file", await photo(), "a.png");
    await expectRejected(noToken, 403, "csrf_failed", before);
    // The server is still answering.
    await w.s1.agent.get("/api/notebook/entries").expect(200);
  });

  it("a path-traversal file name: stored under a server-chosen name, shown by its last segment", async () => {
    const parent = path.dirname(uploadsDir);
    const parentBefore = fs.readdirSync(parent).sort();
    const res = await upload(w.s1, entryId, await photo(), "../../etc/passwd.png", "image/png");
    expect(res.status).toBe(201);
    const file = (res.body as NotebookFileResponse).file;
    expect(file.name).toBe("passwd.webp");
    // A NUL in a part header is malformed multipart (busboy refuses it): rejected, nothing stored.
    await expectRejected(upload(w.s1, entryId, await photo(), "a\u0000b.png", "image/png"), 400, "malformed_upload", await snapshot());
    // A right-to-left override (which could disguise "gpj.exe" as "exe.jpg") is dropped.
    const bidi = await upload(w.s1, entryId, await photo(), "a\u202eb.png", "image/png");
    expect(bidi.status).toBe(201);
    expect(bidi.body.file.name).toBe("ab.webp");
    const long = await upload(w.s1, entryId, await photo(), `${"é".repeat(300)}.png`, "image/png");
    expect(Array.from(long.body.file.name as string).length).toBe(105);
    // Nothing escaped the uploads directory, and every stored name is the server's own pattern.
    expect(fs.readdirSync(parent).sort()).toEqual(parentBefore);
    for (const name of listUploads()) expect(name).toMatch(/^[a-f0-9]{32}(-t)?\.(jpg|webp|pdf)$/);
  });
});

describe("stored photos and reports", () => {
  let entryId: number;
  let jpeg: NotebookFile;
  let report: NotebookFile;
  beforeAll(async () => {
    entryId = await newEntry(w.s1, "Etched and photographed");
    const a = await upload(w.s1, entryId, await jpegWithExif(), "fracture «grain».jpg", "image/jpeg");
    expect(a.status, JSON.stringify(a.body)).toBe(201);
    jpeg = a.body.file;
    const b = await upload(w.s1, entryId, pdf(), "hardness report.pdf", "application/pdf");
    expect(b.status, JSON.stringify(b.body)).toBe(201);
    report = b.body.file;
  });

  it("re-encodes a JPEG as JPEG with EXIF, GPS and names stripped", async () => {
    const original = await jpegWithExif();
    expect((await sharp(original).metadata()).exif).toBeDefined(); // the fixture really has EXIF
    expect(original.includes("SECRET-OWNER-MARK")).toBe(true);
    const res = await w.s1.agent.get(jpeg.url).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    const body = res.body as Buffer;
    const meta = await sharp(body).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(body.includes("SECRET-OWNER-MARK")).toBe(false);
    expect(body.includes("CinderfieldCam")).toBe(false);
    expect(jpeg).toMatchObject({ kind: "image", mimeType: "image/jpeg", width: 800, height: 600, name: "fracture «grain».jpg" });
  });

  it("serves photos inline and PDFs as downloads, with nosniff, a sandboxing CSP and a safe file name", async () => {
    const img = await w.s1.agent.get(jpeg.url).expect(200);
    expect(img.headers["content-type"]).toBe("image/jpeg");
    expect(img.headers["x-content-type-options"]).toBe("nosniff");
    expect(img.headers["content-security-policy"]).toBe("sandbox; default-src 'none'");
    expect(img.headers["content-disposition"]).toBe(`inline; filename="fracture _grain_.jpg"; filename*=UTF-8''fracture%20%C2%ABgrain%C2%BB.jpg`);
    const doc = await w.s1.agent.get(report.url).expect(200);
    expect(doc.headers["content-type"]).toBe("application/pdf");
    expect(doc.headers["content-disposition"]).toMatch(/^attachment; filename="hardness report.pdf"/);
    expect(doc.headers["content-security-policy"]).toBe("sandbox; default-src 'none'");
    expect(report.thumbUrl).toBeNull();
    expect((await w.s1.agent.get(`/api/notebook/files/${report.id}/thumb`)).status).toBe(404);
  });

  it("makes a WebP thumbnail no larger than 320 px", async () => {
    const res = await w.s1.agent.get(jpeg.thumbUrl!).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("image/webp");
    const meta = await sharp(res.body as Buffer).metadata();
    expect(meta.format).toBe("webp");
    expect(Math.max(meta.width!, meta.height!)).toBe(320);
  });

  it("scales a large photo down to 2400 px on its longest edge", async () => {
    const res = await upload(w.s1, entryId, await photo(3000, 1000), "wide.png", "image/png");
    expect(res.status).toBe(201);
    expect(res.body.file).toMatchObject({ width: 2400, height: 800, mimeType: "image/webp", name: "wide.webp" });
  });

  it("another student's file answers 404, like a missing one; the owner's instructor and an admin may see it", async () => {
    const missing = await w.s2.agent.get("/api/notebook/files/999999");
    expect(missing.status).toBe(404);
    for (const s of [w.s2, w.s3, w.other, w.outsider]) {
      for (const url of [jpeg.url, jpeg.thumbUrl!, report.url]) {
        const res = await s.agent.get(url);
        expect(res.status).toBe(404);
        expect(res.body).toEqual(missing.body);
      }
      expect((await s.agent.delete(jpeg.url).set("x-csrf-token", s.csrfToken)).status).toBe(404);
      expect((await upload(s, entryId, await photo(), "intruder.png", "image/png")).status).toBe(404);
    }
    expect((await w.own.agent.get(jpeg.url)).status).toBe(200);
    expect((await w.admin.agent.get(report.url)).status).toBe(200);
    expect((await request(w.t.app).get(jpeg.url)).status).toBe(401);
  });

  it("deleting a file or its entry removes the bytes from disk", async () => {
    const res = await upload(w.s1, entryId, await photo(), "temporary.png", "image/png");
    const file = res.body.file as NotebookFile;
    const row = await w.t.db.read(() => w.t.db.models.NotebookFile.findByPk(file.id));
    const names = [row!.storedName, row!.thumbName!];
    expect(names.every((n) => listUploads().includes(n))).toBe(true);
    expect((await w.s1.agent.delete(file.url).set("x-csrf-token", w.s1.csrfToken)).status).toBe(200);
    expect(names.some((n) => listUploads().includes(n))).toBe(false);
    expect((await w.s1.agent.get(file.url)).status).toBe(404);

    const all = await w.t.db.read(() => w.t.db.models.NotebookFile.findAll({ where: { entryId } }));
    const stored = all.flatMap((f) => [f.storedName, f.thumbName]).filter(Boolean) as string[];
    expect(stored.length).toBeGreaterThan(0);
    expect((await w.s1.agent.delete(`/api/notebook/entries/${entryId}`).set("x-csrf-token", w.s1.csrfToken)).status).toBe(204);
    expect(stored.some((n) => listUploads().includes(n))).toBe(false);
    expect(await w.t.db.read(() => w.t.db.models.NotebookFile.count({ where: { entryId } }))).toBe(0);
  });
});

describe("per-user storage quota", () => {
  let q: TestApp;
  let s: Signed;
  const QUOTA = 60_000;
  beforeAll(async () => {
    // uploadSettings reads the environment when the router is built, like the mail settings.
    process.env.UPLOAD_QUOTA_BYTES = String(QUOTA);
    try {
      q = await createTestApp();
    } finally {
      delete process.env.UPLOAD_QUOTA_BYTES;
    }
    const user = await createUser(q, { email: "quota@cinderfield.test", role: "student" });
    const signed = await signIn(q.app, user.email);
    s = { user, agent: signed.agent, csrfToken: signed.csrfToken };
  });
  afterAll(() => q?.cleanup());

  /** A photo of noise compresses badly: about 20–30 kB stored. */
  const noisy = (seed: number) => {
    const px = Buffer.alloc(160 * 120 * 3);
    let x = seed * 7919 + 1;
    for (let i = 0; i < px.length; i += 1) {
      x = (x * 1103515245 + 12345) & 0x7fffffff;
      px[i] = x & 0xff;
    }
    return sharp(px, { raw: { width: 160, height: 120, channels: 3 } }).jpeg({ quality: 95 }).toBuffer();
  };

  it("holds when uploads race each other, and reports usage", async () => {
    const entryId = await newEntry(s);
    const results = await Promise.all([1, 2, 3, 4, 5, 6].map(async (i) => upload(s, entryId, await noisy(i), `n${i}.jpg`, "image/jpeg")));
    const ok = results.filter((r) => r.status === 201);
    const refused = results.filter((r) => r.status !== 201);
    expect(ok.length).toBeGreaterThan(0);
    expect(refused.length).toBeGreaterThan(0);
    for (const r of refused) {
      expect(r.status).toBe(413);
      expect(r.body.error.code).toBe("quota_exceeded");
      expect(r.body.error.message).toMatch(/storage is full/);
    }
    const list = await s.agent.get("/api/notebook/entries").expect(200);
    const used = list.body.storage.usedBytes as number;
    expect(used).toBeLessThanOrEqual(QUOTA);
    expect(list.body.storage.quotaBytes).toBe(QUOTA);
    // What is counted is what is on disk (photos and thumbnails), and only the accepted files are there.
    const dir = path.join(q.dir, "uploads");
    const onDisk = fs.readdirSync(dir).reduce((sum, name) => sum + fs.statSync(path.join(dir, name)).size, 0);
    expect(onDisk).toBe(used);
    expect(fs.readdirSync(dir).length).toBe(ok.length * 2);
  });
});
