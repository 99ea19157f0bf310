import "server-only";
import { randomUUID } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { attachments, beanLots, ingredients, suppliers, users, type AttachmentKind } from "@/db/schema";
import { invalid, notFound } from "@/lib/errors";
import { checkUpload, cleanFileName } from "@/lib/files/check-upload";
import { deleteObject, putObject } from "@/lib/storage/s3";

export type AttachmentOwner = { ingredientId: string } | { supplierId: string } | { lotId: string };

export type AttachmentRecord = {
  id: string;
  kind: AttachmentKind;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  createdAt: string;
  uploadedByName: string | null;
};

const ownerFilter = (owner: AttachmentOwner) =>
  "ingredientId" in owner
    ? eq(attachments.ingredientId, owner.ingredientId)
    : "supplierId" in owner
      ? eq(attachments.supplierId, owner.supplierId)
      : eq(attachments.lotId, owner.lotId);

const ownerName = (owner: AttachmentOwner) => ("ingredientId" in owner ? "That ingredient" : "supplierId" in owner ? "That supplier" : "That lot");

/** The files of one ingredient, supplier or bean lot, newest first. */
export async function listAttachments({ workspaceId, owner }: { workspaceId: string; owner: AttachmentOwner }): Promise<AttachmentRecord[]> {
  if (!(await ownerExists(workspaceId, owner))) throw notFound(ownerName(owner));
  const rows = await db
    .select({
      id: attachments.id,
      kind: attachments.kind,
      fileName: attachments.fileName,
      contentType: attachments.contentType,
      sizeBytes: attachments.sizeBytes,
      createdAt: attachments.createdAt,
      uploadedByName: users.name,
    })
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedById))
    .where(and(eq(attachments.workspaceId, workspaceId), ownerFilter(owner)))
    .orderBy(desc(attachments.createdAt));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

async function ownerExists(workspaceId: string, owner: AttachmentOwner): Promise<boolean> {
  const rows =
    "ingredientId" in owner
      ? await db.select({ id: ingredients.id }).from(ingredients).where(and(eq(ingredients.workspaceId, workspaceId), eq(ingredients.id, owner.ingredientId)))
      : "supplierId" in owner
        ? await db.select({ id: suppliers.id }).from(suppliers).where(and(eq(suppliers.workspaceId, workspaceId), eq(suppliers.id, owner.supplierId)))
        : await db.select({ id: beanLots.id }).from(beanLots).where(and(eq(beanLots.workspaceId, workspaceId), eq(beanLots.id, owner.lotId)));
  return rows.length > 0;
}

/**
 * Stores an uploaded file for an ingredient, a supplier or a bean lot: its type and size are
 * checked on its bytes (checkUpload), it goes to object storage under a key we
 * generate, then its row is written. If the row cannot be written, the stored
 * object is removed again so nothing is left half-saved.
 */
export async function addAttachment({
  workspaceId,
  userId,
  owner,
  kind,
  fileName,
  bytes,
}: {
  workspaceId: string;
  userId: string;
  owner: AttachmentOwner;
  kind: AttachmentKind;
  fileName: string;
  bytes: Uint8Array;
}): Promise<AttachmentRecord> {
  if (!(await ownerExists(workspaceId, owner))) throw notFound(ownerName(owner));
  const check = await checkUpload(bytes);
  if (!check.ok) throw invalid(check.reason, { file: [check.reason] });
  const key = `workspaces/${workspaceId}/files/${randomUUID()}.${check.extension}`;
  await putObject({ key, body: bytes, contentType: check.contentType });
  try {
    const [row] = await db
      .insert(attachments)
      .values({
        workspaceId,
        ...owner,
        kind,
        fileName: cleanFileName(fileName),
        contentType: check.contentType,
        sizeBytes: check.sizeBytes,
        storageKey: key,
        uploadedById: userId,
      })
      .returning();
    return {
      id: row!.id,
      kind: row!.kind,
      fileName: row!.fileName,
      contentType: row!.contentType,
      sizeBytes: row!.sizeBytes,
      createdAt: row!.createdAt.toISOString(),
      uploadedByName: null,
    };
  } catch (err) {
    await deleteObject({ key }).catch(() => undefined);
    throw err;
  }
}

/** One file of the workspace (for a download), or a not-found error for anyone else's. */
export async function getAttachment({ workspaceId, attachmentId }: { workspaceId: string; attachmentId: string }) {
  const [row] = await db
    .select()
    .from(attachments)
    .where(and(eq(attachments.workspaceId, workspaceId), eq(attachments.id, attachmentId)));
  if (!row) throw notFound("That file");
  return row;
}

/** Removes a file of one ingredient, supplier or lot: its row, then its stored object. */
export async function deleteAttachment({
  workspaceId,
  owner,
  attachmentId,
}: {
  workspaceId: string;
  owner: AttachmentOwner;
  attachmentId: string;
}): Promise<void> {
  const [row] = await db
    .delete(attachments)
    .where(and(eq(attachments.workspaceId, workspaceId), eq(attachments.id, attachmentId), ownerFilter(owner)))
    .returning({ key: attachments.storageKey });
  if (!row) throw notFound("That file");
  // The row is gone, so the file can no longer be reached; a failed cleanup only leaves an orphan object.
  await deleteObject({ key: row.key }).catch((err) => console.error("could not remove a stored file:", err));
}
