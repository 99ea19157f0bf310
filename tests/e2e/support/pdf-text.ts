import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

/** Whether poppler-utils' pdftotext is installed (Debian: apt-get install poppler-utils). */
export function hasPdftotext(): boolean {
  try {
    execFileSync("pdftotext", ["-v"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

/**
 * A PDF's text (pdftotext -layout) and its page count and size (pdfinfo).
 * Without poppler-utils: null, and the caller checks the page's DOM instead.
 */
export function readPdf(bytes: Buffer): { text: string; pages: number; pageSize: string } | null {
  if (!hasPdftotext()) return null;
  const file = path.join(mkdtempSync(path.join(tmpdir(), "barwright-pdf-")), "sheet.pdf");
  writeFileSync(file, bytes);
  const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
  const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
  return {
    text,
    pages: Number(/^Pages:\s+(\d+)/m.exec(info)?.[1] ?? 0),
    pageSize: /^Page size:\s+(.+)$/m.exec(info)?.[1]?.trim() ?? "",
  };
}
