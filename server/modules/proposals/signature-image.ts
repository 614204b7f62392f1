import sharp from "sharp";
import { AppError } from "../../lib/errors.ts";
import { MAX_SIGNATURE_PNG_BYTES, PNG_DATA_URL_PREFIX } from "../../../shared/proposals/schemas.ts";

const PNG_MAGIC = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

const bad = (field: string, message: string) => new AppError("invalid-input", message, 400, { [field]: message });

/** A drawn signature's bytes, checked: a real PNG (by its bytes, then decoded), at most 1 MB, a sane size. */
export async function checkedSignaturePng(dataUrl: string, field: string): Promise<Buffer> {
  if (!dataUrl.startsWith(PNG_DATA_URL_PREFIX)) throw bad(field, "The drawn signature must be a PNG image.");
  const base64 = dataUrl.slice(PNG_DATA_URL_PREFIX.length);
  if (!/^[A-Za-z0-9+/]*={0,2}$/.test(base64)) throw bad(field, "The drawn signature is not valid base64 data.");
  const bytes = Buffer.from(base64, "base64");
  if (bytes.length > MAX_SIGNATURE_PNG_BYTES) throw bad(field, "The drawn signature image is too large: at most 1 MB.");
  if (bytes.length < PNG_MAGIC.length || !bytes.subarray(0, 8).equals(PNG_MAGIC)) throw bad(field, "The drawn signature is not a PNG image (its bytes were checked).");
  try {
    const meta = await sharp(bytes, { limitInputPixels: 8_000_000 }).metadata();
    if (meta.format !== "png" || !meta.width || !meta.height || meta.width > 4_000 || meta.height > 2_000) throw new Error("size");
  } catch {
    throw bad(field, "The drawn signature image could not be read, or is larger than 4000 × 2000 pixels.");
  }
  return bytes;
}
