import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { attachments, memberships } from "@/db/schema";
import { checkUpload } from "@/lib/files/check-upload";
import { invalid } from "@/lib/errors";
import { deleteObject, getObject, putObject } from "@/lib/storage/s3";
import type { FileEntry } from "./format";

export const sha256Hex = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/** A stored file's bytes and their SHA-256. */
export async function readStoredFile(key: string): Promise<{ data: Uint8Array; sha256: string }> {
  const object = await getObject({ key });
  const data = new Uint8Array(await new Response(object.body).arrayBuffer());
  return { data, sha256: sha256Hex(data) };
}

/**
 * The bytes of one exported file: from the document (base64) or, for an export
 * that only references files, from this server's storage — and then only a
 * file of a workspace the importer owns. Either way the bytes must match the
 * SHA-256 and size the export recorded, and pass the upload checks again.
 */
async function bytesOf(entry: FileEntry, importerId: string): Promise<Uint8Array> {
  let data: Uint8Array;
  if (entry.data !== undefined) {
    data = new Uint8Array(Buffer.from(entry.data, "base64"));
  } else {
    const [owned] = await db
      .select({ id: attachments.id })
      .from(attachments)
      .innerJoin(memberships, eq(memberships.workspaceId, attachments.workspaceId))
      .where(and(eq(attachments.storageKey, entry.storageKey), eq(memberships.userId, importerId), eq(memberships.role, "owner")));
    if (!owned) {
      throw invalid(
        "The file refers to stored files that are not on this server (or not in a workspace you own). Download the export again with files included.",
      );
    }
    data = (await readStoredFile(entry.storageKey)).data;
  }
  if (data.byteLength !== entry.sizeBytes || sha256Hex(data) !== entry.sha256) {
    throw invalid("A file inside the export does not match its recorded checksum: the export is damaged. Nothing was imported.");
  }
  return data;
}

export type StoredCopy = { attachmentId: string; key: string };

/**
 * Stores a copy of every file of the export under new keys of the new
 * workspace. If anything fails, the copies already stored are removed again.
 */
export async function storeFileCopies({
  entries,
  workspaceId,
  importerId,
}: {
  entries: FileEntry[];
  workspaceId: string;
  importerId: string;
}): Promise<StoredCopy[]> {
  const stored: StoredCopy[] = [];
  try {
    for (const entry of entries) {
      const data = await bytesOf(entry, importerId);
      const check = await checkUpload(data);
      if (!check.ok) throw invalid(`A file inside the export was refused: ${check.reason} Nothing was imported.`);
      const key = `workspaces/${workspaceId}/files/${randomUUID()}.${check.extension}`;
      await putObject({ key, body: data, contentType: check.contentType });
      stored.push({ attachmentId: entry.attachmentId, key });
    }
    return stored;
  } catch (err) {
    await removeFileCopies(stored);
    throw err;
  }
}

export async function removeFileCopies(copies: StoredCopy[]): Promise<void> {
  for (const copy of copies) await deleteObject({ key: copy.key }).catch(() => undefined);
}
