/** Small real files for upload tests, built byte by byte. */

/** A minimal valid one-page PDF. */
export function tinyPdf(text = "Spec sheet"): Uint8Array {
  const body = `%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\n% ${text}\ntrailer<</Root 1 0 R>>\n%%EOF\n`;
  return new Uint8Array(Buffer.from(body, "latin1"));
}

/** The PNG signature and an IHDR chunk: enough for a magic-byte check. */
export function tinyPng(): Uint8Array {
  return new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0, 0x90, 0x77, 0x53, 0xde]);
}

/** The start of a Windows executable (an "MZ" DOS header pointing at a "PE" header). */
export function windowsExecutable(): Uint8Array {
  const bytes = new Uint8Array(512);
  bytes.set([0x4d, 0x5a], 0); // MZ
  bytes.set([0x80, 0, 0, 0], 0x3c); // e_lfanew = 0x80
  bytes.set([0x50, 0x45, 0, 0], 0x80); // PE\0\0
  return bytes;
}
