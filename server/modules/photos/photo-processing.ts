import sharp from "sharp";
import { fileTypeFromBuffer } from "file-type";
import { AppError } from "../../lib/errors.ts";

export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
export const THUMB_WIDTH_PX = 480;
/** Refuse decompression bombs: a 48 MP phone photo is well inside this. */
const MAX_INPUT_PIXELS = 120_000_000;

type Accepted = "image/jpeg" | "image/png" | "image/webp" | "image/heic" | "image/heif";
const ACCEPTED = new Set<string>(["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif"]);

export interface ProcessedPhoto {
  main: { bytes: Buffer; contentType: string; ext: string; width: number; height: number };
  thumb: { bytes: Buffer; contentType: string; ext: string };
}

const notAPhoto = () =>
  new AppError("unsupported-media-type", "This file is not a JPEG, PNG, WebP or HEIC photo. Its contents were checked, not its name.", 415, {
    file: "Choose a JPEG, PNG, WebP or HEIC photo.",
  });

/**
 * Checks what the bytes really are (never the name or the declared type), then re-encodes:
 * EXIF orientation is applied to the pixels and all metadata, GPS position included, is
 * dropped, because sharp writes none unless asked. HEIC becomes JPEG so every browser shows it.
 */
export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !ACCEPTED.has(type.mime)) throw notAPhoto();
  const mime = type.mime as Accepted;
  const isHeif = mime === "image/heic" || mime === "image/heif";
  const image = () => sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS }).rotate();

  try {
    const encoded =
      mime === "image/png" ? { pipeline: image().png(), contentType: "image/png", ext: "png" } :
      mime === "image/webp" ? { pipeline: image().webp({ quality: 85 }), contentType: "image/webp", ext: "webp" } :
      { pipeline: image().jpeg({ quality: 85 }), contentType: "image/jpeg", ext: "jpg" };
    const { data, info } = await encoded.pipeline.toBuffer({ resolveWithObject: true });
    const thumb = await image().resize({ width: THUMB_WIDTH_PX, withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();
    return {
      main: { bytes: data, contentType: encoded.contentType, ext: encoded.ext, width: info.width, height: info.height },
      thumb: { bytes: thumb, contentType: "image/webp", ext: "webp" },
    };
  } catch (err) {
    if (isHeif) {
      // Prebuilt sharp reads AVIF but usually not HEVC-coded HEIC (a codec licence matter).
      throw new AppError(
        "heic-not-supported",
        "This HEIC photo can't be converted here. On the phone, set the camera to Most Compatible (JPEG), or share the photo as JPEG, and upload it again.",
        415,
        { file: "HEIC could not be converted; upload a JPEG instead." },
      );
    }
    const message = err instanceof Error && /pixel limit/i.test(err.message)
      ? "This image has too many pixels to process. Please upload a smaller photo."
      : "The photo could not be read; the file may be damaged. Please try another file.";
    throw new AppError("unreadable-image", message, 400, { file: message });
  }
}

/** A letterhead logo never needs more than this many pixels across (the PDF draws it about 2 in wide). */
export const MAX_LOGO_WIDTH_PX = 1200;
export const MAX_LOGO_HEIGHT_PX = 600;

/**
 * A company logo, re-encoded like a photo: the bytes must be PNG or JPEG, and only their pixels are
 * kept (no EXIF or text chunks, nothing appended after the image). PNG stays PNG for transparency;
 * anything wider than MAX_LOGO_WIDTH_PX is scaled down.
 */
export async function processLogo(bytes: Buffer): Promise<{ bytes: Buffer; contentType: "image/png" | "image/jpeg"; ext: "png" | "jpg" }> {
  const type = await fileTypeFromBuffer(bytes);
  if (!type || (type.mime !== "image/png" && type.mime !== "image/jpeg")) {
    throw new AppError("unsupported-media-type", "The logo must be a PNG or JPEG image. Its contents were checked, not its name.", 415, { file: "Choose a PNG or JPEG logo." });
  }
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS }).rotate().resize({ width: MAX_LOGO_WIDTH_PX, height: MAX_LOGO_HEIGHT_PX, fit: "inside", withoutEnlargement: true });
    return type.mime === "image/png"
      ? { bytes: await image.png().toBuffer(), contentType: "image/png", ext: "png" }
      : { bytes: await image.jpeg({ quality: 90 }).toBuffer(), contentType: "image/jpeg", ext: "jpg" };
  } catch {
    const message = "The logo could not be read; the file may be damaged. Please try another file.";
    throw new AppError("unreadable-image", message, 400, { file: message });
  }
}
