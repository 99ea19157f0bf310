import { index, integer, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { createdAt } from "./columns";
import { suppliers } from "./suppliers";
import { users } from "./users";
import { workspaces } from "./workspaces";

/**
 * One imported price-list upload: which supplier, which file (its SHA-256, so
 * the same file is recognised), and what became of its rows. The quotes it
 * created carry `source = "price-list:<id>"`.
 */
export const priceListImports = pgTable(
  "price_list_imports",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    supplierId: uuid("supplier_id")
      .notNull()
      .references(() => suppliers.id, { onDelete: "restrict" }),
    fileName: text("file_name").notNull(),
    fileSha256: text("file_sha256").notNull(),
    encoding: text("encoding").notNull(),
    rowCount: integer("row_count").notNull(),
    importedCount: integer("imported_count").notNull(),
    duplicateCount: integer("duplicate_count").notNull(),
    invalidCount: integer("invalid_count").notNull(),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("price_list_imports_workspace_idx").on(t.workspaceId, t.createdAt),
    index("price_list_imports_supplier_idx").on(t.supplierId),
  ],
);

export type PriceListImport = typeof priceListImports.$inferSelect;
