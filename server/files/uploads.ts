import "server-only";
import { randomBytes } from "node:crypto";
import fs from "node:fs/promises";
import path from "node:path";
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { uploadsFolder } from "@/db/env";
import { TooLargeError, UnsupportedTypeError, ValidationError } from "@/lib/errors";

/**
 * Photos and schematics of a job, kept outside public/ under random names. The type is sniffed
 * from the bytes (file-type), never taken from the name or the browser's claim.
 */

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

/**
 * Largest image we decode: 50 megapixels (a phone's full-resolution photo is 12–50). A few kilobytes of
 * PNG or WebP can declare 30 000 × 30 000 pixels and need gigabytes to decode; sharp refuses past this
 * (`limitInputPixels`), and we check the declared size first to answer with a plain message.
 */
export const MAX_IMAGE_PIXELS = 50_000_000;

/** Sniffed MIME type → stored extension. PDF is for schematics; images may be either. */
export const ALLOWED_TYPES: Record<string, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "application/pdf": "pdf",
};

export function uploadsDir(): string {
  return uploadsFolder();
}

/** A browser sends only a base name; anything with folders, "..", or control characters is refused. */
export function checkOriginalName(name: string): string {
  const trimmed = name.trim();
  if (!trimmed || /[\/\\\u0000-\u001f\u007f]/.test(trimmed) || trimmed.includes("..") || trimmed.length > 200) {
    throw new ValidationError("That file name is not accepted: use a plain name without folders or “..”, up to 200 characters.", {
      file: "Rename the file to a plain name (letters, numbers, dashes) and try again.",
    });
  }
  return trimmed;
}

export interface PreparedUpload {
  type: string;
  ext: string;
  bytes: Buffer;
  thumbnail: Buffer | null;
}

/** Checks size and content; nothing is written until every check has passed. */
export async function prepareUpload(file: File): Promise<PreparedUpload> {
  if (file.size === 0) throw new ValidationError("The file is empty.", { file: "Choose a file that is not empty." });
  if (file.size > MAX_UPLOAD_BYTES) throw new TooLargeError("Files may be up to 20 MB.", { file: "This file is over 20 MB; export a smaller copy." });
  const bytes = Buffer.from(await file.arrayBuffer());
  const sniffed = await fileTypeFromBuffer(bytes);
  const type = sniffed?.mime;
  if (!type || !ALLOWED_TYPES[type]) {
    throw new UnsupportedTypeError("Only JPEG, PNG or WebP photos and PDF or image schematics can be attached.", {
      file: `This file's content is ${sniffed ? sniffed.mime : "not a photo or PDF"}, whatever its name says.`,
    });
  }
  let thumbnail: Buffer | null = null;
  if (type.startsWith("image/")) {
    const tooBig = () =>
      new TooLargeError(`Images may be up to ${MAX_IMAGE_PIXELS / 1e6} megapixels.`, {
        file: "This image has too many pixels; export a smaller copy (for example 4000 × 3000).",
      });
    let pixels = 0;
    try {
      const { width = 0, height = 0 } = await sharp(bytes, { limitInputPixels: false }).metadata(); // reads the header only
      pixels = width * height;
    } catch {
      pixels = 0; // unreadable header: the decode below says so
    }
    if (pixels > MAX_IMAGE_PIXELS) throw tooBig();
    try {
      thumbnail = await sharp(bytes, { limitInputPixels: MAX_IMAGE_PIXELS })
        .rotate()
        .resize(480, 480, { fit: "inside", withoutEnlargement: true })
        .webp({ quality: 78 })
        .toBuffer();
    } catch (err) {
      if (/pixel limit/i.test(String(err))) throw tooBig();
      throw new UnsupportedTypeError("That image could not be read; it may be damaged.", { file: "The image could not be opened; save it again and retry." });
    }
  }
  return { type, ext: ALLOWED_TYPES[type], bytes, thumbnail };
}

export const thumbnailName = (storedName: string) => `${storedName}.thumb.webp`;

/** Only ever a base name inside the uploads folder. */
const storedPath = (name: string) => path.join(/*turbopackIgnore: true*/ uploadsDir(), path.basename(name));

/** Writes the file (and its thumbnail) under a fresh random name; returns the name. */
export async function storeUpload(prepared: PreparedUpload): Promise<string> {
  await fs.mkdir(uploadsDir(), { recursive: true });
  const storedName = `${randomBytes(16).toString("hex")}.${prepared.ext}`;
  await fs.writeFile(storedPath(storedName), prepared.bytes, { flag: "wx" });
  if (prepared.thumbnail) await fs.writeFile(storedPath(thumbnailName(storedName)), prepared.thumbnail, { flag: "wx" });
  return storedName;
}

export async function removeStored(storedName: string): Promise<void> {
  await Promise.all([fs.rm(storedPath(storedName), { force: true }), fs.rm(storedPath(thumbnailName(path.basename(storedName))), { force: true })]);
}

export async function readStored(storedName: string, thumb: boolean): Promise<Buffer | null> {
  try {
    return await fs.readFile(storedPath(thumb ? thumbnailName(path.basename(storedName)) : storedName));
  } catch {
    return null;
  }
}
