/**
 * Photos are never stored as sent. The header is read first (sharp metadata, which reads no
 * pixels) and images over the pixel cap are refused before any decoding (ASVS 5.2.6); then the
 * image is decoded once more with the same cap, turned upright from its EXIF orientation, scaled
 * to fit the longest-edge limit and RE-ENCODED: JPEG stays JPEG, PNG and WebP become WebP. sharp
 * writes no metadata unless asked (EXIF with GPS position and camera serials, XMP, comments are
 * dropped; colours are converted to sRGB), so the output carries none (ASVS 14.2.8; tested).
 * A 320 px WebP thumbnail is made from the same decoded image.
 */
import sharp, { type Metadata } from "sharp";
import { HttpError } from "../errors";
import type { UploadSettings } from "./settings";

export interface ProcessedImage {
  main: { data: Buffer; ext: "jpg" | "webp"; mimeType: "image/jpeg" | "image/webp"; width: number; height: number };
  thumb: { data: Buffer; width: number; height: number };
}

// One libvips thread per image: uploads are few, and the API must stay responsive on 2 cores.
sharp.concurrency(1);

const unreadable = () => new HttpError(422, "invalid_image", "The image could not be read: it may be damaged or truncated. Export it again and retry.");

export async function processImage(buffer: Buffer, format: "jpeg" | "png" | "webp", settings: Pick<UploadSettings, "maxPixels" | "maxEdgePx" | "thumbEdgePx">): Promise<ProcessedImage> {
  const input = { limitInputPixels: settings.maxPixels, failOn: "error" as const, animated: false };
  let meta: Metadata;
  try {
    meta = await sharp(buffer, input).metadata();
  } catch (err) {
    if (/pixel limit/i.test(String((err as Error)?.message))) throw tooManyPixels(settings.maxPixels);
    throw unreadable();
  }
  // The decoder must agree with the magic bytes (sharp can also read SVG, TIFF, GIF…: never here).
  if (meta.format !== format) throw unreadable();
  const width = meta.width ?? 0;
  const height = meta.height ?? 0;
  if (width <= 0 || height <= 0) throw unreadable();
  if (width * height > settings.maxPixels) throw tooManyPixels(settings.maxPixels, width, height);

  try {
    const upright = sharp(buffer, input).autoOrient();
    const fit = (edge: number) => ({ width: edge, height: edge, fit: "inside" as const, withoutEnlargement: true });
    const mainPipeline = upright.clone().resize(fit(settings.maxEdgePx));
    const main =
      format === "jpeg"
        ? { ...(await mainPipeline.jpeg({ quality: 85, mozjpeg: true }).toBuffer({ resolveWithObject: true })), ext: "jpg" as const, mimeType: "image/jpeg" as const }
        : { ...(await mainPipeline.webp({ quality: 85 }).toBuffer({ resolveWithObject: true })), ext: "webp" as const, mimeType: "image/webp" as const };
    const thumb = await upright.clone().resize(fit(settings.thumbEdgePx)).webp({ quality: 72 }).toBuffer({ resolveWithObject: true });
    return {
      main: { data: main.data, ext: main.ext, mimeType: main.mimeType, width: main.info.width, height: main.info.height },
      thumb: { data: thumb.data, width: thumb.info.width, height: thumb.info.height },
    };
  } catch (err) {
    if (/pixel limit/i.test(String((err as Error)?.message))) throw tooManyPixels(settings.maxPixels);
    throw unreadable();
  }
}

function tooManyPixels(maxPixels: number, width?: number, height?: number): HttpError {
  const mp = (maxPixels / 1e6).toFixed(0);
  const size = width && height ? ` (${width} × ${height} pixels)` : "";
  return new HttpError(413, "image_too_large", `The image is too large${size}: at most ${mp} megapixels are accepted. Scale it down and retry.`);
}
