/**
 * The demo's sample certificate on lot EC-2026-07: an invented certificate of
 * origin as a small PDF, stored in object storage like any upload. The seed
 * runs before the app, so object storage must already be up (npm run demo and
 * the browser tests start it first); without it the file is skipped, with a note.
 */
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { deleteObject, putObject } from "../../lib/storage/object-store";
import { attachments, beanLots } from "../schema";
import type { DemoSeeder } from "./context";
import { samplePdf } from "./sample-pdf";

const LOT_CODE = "EC-2026-07";
const FILE_NAME = "EC-2026-07 certificate of origin.pdf";

const lines = [
  "Certificate of origin - DEMO DATA, INVENTED",
  "Lot EC-2026-07: 250 kg dried, fermented cocoa beans",
  "Origin: Ecuador, Manabi province",
  "Producer: Orvalle Growers Cooperative (invented)",
  "Exporter: Greyfriars Bean Importers (invented)",
  "Harvest 2026. Issued 2026-09-01 by an invented chamber of commerce.",
  "This document is a sample made for the Barwright demo. It certifies nothing.",
];

export const seedLotFiles: DemoSeeder = async ({ tx, workspaceId, people }) => {
  const [lot] = await tx
    .select({ id: beanLots.id })
    .from(beanLots)
    .where(and(eq(beanLots.workspaceId, workspaceId), eq(beanLots.code, LOT_CODE)));
  if (!lot) return;
  const [existing] = await tx
    .select({ id: attachments.id })
    .from(attachments)
    .where(and(eq(attachments.workspaceId, workspaceId), eq(attachments.lotId, lot.id), eq(attachments.fileName, FILE_NAME)));
  if (existing) return;
  const bytes = samplePdf(lines);
  const key = `workspaces/${workspaceId}/files/${randomUUID()}.pdf`;
  try {
    await putObject({ key, body: bytes, contentType: "application/pdf" });
  } catch {
    console.warn(`seed: object storage is not answering; the sample certificate of lot ${LOT_CODE} was left out (start it, then seed again).`);
    return;
  }
  try {
    await tx.insert(attachments).values({
      workspaceId,
      lotId: lot.id,
      kind: "certificate",
      fileName: FILE_NAME,
      contentType: "application/pdf",
      sizeBytes: bytes.byteLength,
      storageKey: key,
      uploadedById: people.buyer,
    });
  } catch (err) {
    await deleteObject({ key }).catch(() => undefined);
    throw err;
  }
};
