import { fileTypeFromBuffer } from "file-type";

/** Files we keep for spec sheets and certificates: what they are, by content. */
export const ALLOWED_FILE_TYPES = {
  "application/pdf": "pdf",
  "image/png": "png",
  "image/jpeg": "jpg",
} as const;

export type AllowedContentType = keyof typeof ALLOWED_FILE_TYPES;

/** 10 MiB: a scanned certificate fits, a stray video does not. */
export const MAX_FILE_BYTES = 10 * 1024 * 1024;

export type UploadCheck =
  | { ok: true; contentType: AllowedContentType; extension: string; sizeBytes: number }
  | { ok: false; reason: string };

/**
 * Accepts a PDF, PNG or JPEG judged by its first bytes (magic numbers, via
 * file-type), never by its name or the browser's claimed type, and at most
 * MAX_FILE_BYTES. Empty files are refused too.
 */
export async function checkUpload(bytes: Uint8Array): Promise<UploadCheck> {
  if (bytes.byteLength === 0) return { ok: false, reason: "That file is empty." };
  if (bytes.byteLength > MAX_FILE_BYTES) {
    return { ok: false, reason: `That file is ${megabytes(bytes.byteLength)}; files can be at most ${megabytes(MAX_FILE_BYTES)}.` };
  }
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !(type.mime in ALLOWED_FILE_TYPES)) {
    const what = type ? `really of type ${type.ext.toUpperCase()}` : "not of a type we recognise";
    return { ok: false, reason: `That file is ${what}, judged by its content, not its name. Attach a PDF, PNG or JPEG.` };
  }
  const contentType = type.mime as AllowedContentType;
  return { ok: true, contentType, extension: ALLOWED_FILE_TYPES[contentType], sizeBytes: bytes.byteLength };
}

export function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** A display name without paths or control characters (the key is ours, never this). */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const clean = base.replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 160);
  return clean || "file";
}
