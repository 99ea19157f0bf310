import { check, index, integer, pgEnum, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { createdAt } from "./columns";
import { ingredients } from "./ingredients";
import { beanLots } from "./lots";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

export const attachmentKinds = ["spec_sheet", "certificate", "lab_report", "other"] as const;
export type AttachmentKind = (typeof attachmentKinds)[number];
export const attachmentKindEnum = pgEnum("attachment_kind", attachmentKinds);

/**
 * A file (spec sheet, certificate, lab report) attached to exactly one
 * ingredient, one supplier or one bean lot. The bytes live in object storage under `storageKey`, a key we
 * generate; `fileName` is only what the uploader called it, for display.
 * `contentType` is what the bytes are (magic bytes), never what the name says.
 */
export const attachments = pgTable(
  "attachments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    ingredientId: uuid("ingredient_id").references(() => ingredients.id, { onDelete: "restrict" }),
    supplierId: uuid("supplier_id").references(() => suppliers.id, { onDelete: "restrict" }),
    lotId: uuid("lot_id").references(() => beanLots.id, { onDelete: "restrict" }),
    kind: attachmentKindEnum("kind").notNull().default("spec_sheet"),
    fileName: text("file_name").notNull(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    storageKey: text("storage_key").notNull().unique(),
    uploadedById: uuid("uploaded_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("attachments_workspace_idx").on(t.workspaceId),
    index("attachments_ingredient_idx").on(t.ingredientId),
    index("attachments_supplier_idx").on(t.supplierId),
    index("attachments_lot_idx").on(t.lotId),
    check("attachments_one_owner", sql`num_nonnulls(${t.ingredientId}, ${t.supplierId}, ${t.lotId}) = 1`),
  ],
);

export type Attachment = typeof attachments.$inferSelect;
export type NewAttachment = typeof attachments.$inferInsert;
