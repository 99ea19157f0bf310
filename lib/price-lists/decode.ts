import chardet from "chardet";
import { fileTypeFromBuffer } from "file-type";
import iconv from "iconv-lite";
import { MAX_PRICE_LIST_BYTES } from "./limits";

export type Decoded = { ok: true; text: string; encoding: string } | { ok: false; reason: string };

// Single-byte and UTF-16 encodings that spreadsheets export CSV in; chardet's names.
const ACCEPTED = new Set(["ISO-8859-1", "ISO-8859-2", "ISO-8859-15", "windows-1250", "windows-1252", "UTF-16LE", "UTF-16BE"]);

const SAVE_AS = "Save it from your spreadsheet as “CSV UTF-8” and upload it again.";

/**
 * A price list's bytes as text. Refuses what is not a text file (a PDF, a
 * spreadsheet workbook, an image, anything with NUL bytes), then reads UTF-8
 * (with or without BOM) or UTF-16 by BOM, and otherwise takes the encoding
 * chardet detects when it is one of the common spreadsheet encodings. Anything
 * else gets a clear error rather than garbled names.
 */
export async function decodePriceList(bytes: Uint8Array): Promise<Decoded> {
  if (bytes.byteLength === 0) return { ok: false, reason: "That file is empty." };
  if (bytes.byteLength > MAX_PRICE_LIST_BYTES) {
    return { ok: false, reason: `That file is larger than ${MAX_PRICE_LIST_BYTES / (1024 * 1024)} MB. Split the price list and upload the parts.` };
  }
  const type = await fileTypeFromBuffer(bytes);
  if (type) {
    const workbook = ["xlsx", "xls", "ods", "zip", "cfb"].includes(type.ext);
    return {
      ok: false,
      reason: workbook
        ? `That is a spreadsheet workbook (${type.ext.toUpperCase()}), not a CSV file. ${SAVE_AS}`
        : `That is a ${type.ext.toUpperCase()} file, not a CSV file. Upload the price list as CSV.`,
    };
  }
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return utf8(bytes.subarray(3), "UTF-8");
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return { ok: true, text: iconv.decode(Buffer.from(bytes.subarray(2)), "utf-16le"), encoding: "UTF-16LE" };
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return { ok: true, text: iconv.decode(Buffer.from(bytes.subarray(2)), "utf-16be"), encoding: "UTF-16BE" };
  if (bytes.includes(0)) return { ok: false, reason: `That file is not text (it contains binary data), so it is not a CSV file.` };
  const asUtf8 = utf8(bytes, "UTF-8");
  if (asUtf8.ok) return asUtf8;
  const guess = chardet.detect(bytes);
  // WHATWG Encoding Standard: the label "iso-8859-1" means windows-1252 (its superset, with € and curly quotes).
  const detected = guess === "ISO-8859-1" ? "windows-1252" : guess;
  if (detected && ACCEPTED.has(detected) && iconv.encodingExists(detected)) {
    return { ok: true, text: iconv.decode(Buffer.from(bytes), detected), encoding: detected };
  }
  return { ok: false, reason: `We could not tell this file's text encoding${detected ? ` (it looks like ${detected})` : ""}. ${SAVE_AS}` };
}

function utf8(bytes: Uint8Array, encoding: string): Decoded {
  try {
    return { ok: true, text: new TextDecoder("utf-8", { fatal: true }).decode(bytes), encoding };
  } catch {
    return { ok: false, reason: "not UTF-8" };
  }
}
