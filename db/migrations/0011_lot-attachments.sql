ALTER TYPE "public"."attachment_kind" ADD VALUE 'lab_report' BEFORE 'other';--> statement-breakpoint
ALTER TABLE "attachments" DROP CONSTRAINT "attachments_one_owner";--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "lot_id" uuid;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "attachments_lot_idx" ON "attachments" USING btree ("lot_id");--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_one_owner" CHECK (num_nonnulls("attachments"."ingredient_id", "attachments"."supplier_id", "attachments"."lot_id") = 1);