CREATE TYPE "public"."processing_step" AS ENUM('sorting', 'roasting', 'winnowing');--> statement-breakpoint
CREATE TABLE "bean_lots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"code" text NOT NULL,
	"supplier_id" uuid,
	"origin_country" text NOT NULL,
	"origin_region" text,
	"producer" text,
	"harvest_year" integer,
	"arrived_on" date NOT NULL,
	"mass_received_kg" numeric(14, 3) NOT NULL,
	"price_paid" numeric(16, 4) NOT NULL,
	"currency" char(3) NOT NULL,
	"moisture_percent" numeric(6, 3),
	"notes" text,
	"created_by_id" uuid,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "bean_lots_workspace_code" UNIQUE("workspace_id","code")
);
--> statement-breakpoint
CREATE TABLE "cut_tests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"lot_id" uuid NOT NULL,
	"tested_on" date NOT NULL,
	"sample_size" integer NOT NULL,
	"well_fermented" integer DEFAULT 0 NOT NULL,
	"partly_fermented" integer DEFAULT 0 NOT NULL,
	"slaty" integer DEFAULT 0 NOT NULL,
	"mouldy" integer DEFAULT 0 NOT NULL,
	"insect_damaged" integer DEFAULT 0 NOT NULL,
	"germinated" integer DEFAULT 0 NOT NULL,
	"notes" text,
	"tested_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lot_costs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"lot_id" uuid NOT NULL,
	"label" text NOT NULL,
	"amount" numeric(16, 4) NOT NULL,
	"currency" char(3) NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "processing_records" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"lot_id" uuid NOT NULL,
	"step" "processing_step" NOT NULL,
	"performed_on" date NOT NULL,
	"performed_by_id" uuid,
	"mass_in_kg" numeric(14, 3) NOT NULL,
	"mass_out_kg" numeric(14, 3) NOT NULL,
	"rejects_kg" numeric(14, 3),
	"shell_kg" numeric(14, 3),
	"dust_kg" numeric(14, 3),
	"roast_temperature_c" numeric(6, 1),
	"roast_minutes" numeric(6, 1),
	"oven_load_kg" numeric(14, 3),
	"roast_preset_id" uuid,
	"cost" numeric(16, 4),
	"notes" text,
	"submission_key" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "processing_records_workspace_submission" UNIQUE("workspace_id","submission_key")
);
--> statement-breakpoint
CREATE TABLE "roast_presets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"temperature_c" numeric(6, 1) NOT NULL,
	"minutes" numeric(6, 1) NOT NULL,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "roast_presets_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
ALTER TABLE "workspaces" ADD COLUMN "estimated_nib_yield_percent" numeric(6, 3) DEFAULT '78' NOT NULL;--> statement-breakpoint
ALTER TABLE "bean_lots" ADD CONSTRAINT "bean_lots_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bean_lots" ADD CONSTRAINT "bean_lots_supplier_id_suppliers_id_fk" FOREIGN KEY ("supplier_id") REFERENCES "public"."suppliers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bean_lots" ADD CONSTRAINT "bean_lots_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cut_tests" ADD CONSTRAINT "cut_tests_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cut_tests" ADD CONSTRAINT "cut_tests_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cut_tests" ADD CONSTRAINT "cut_tests_tested_by_id_users_id_fk" FOREIGN KEY ("tested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lot_costs" ADD CONSTRAINT "lot_costs_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lot_costs" ADD CONSTRAINT "lot_costs_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "processing_records" ADD CONSTRAINT "processing_records_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "processing_records" ADD CONSTRAINT "processing_records_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "processing_records" ADD CONSTRAINT "processing_records_performed_by_id_users_id_fk" FOREIGN KEY ("performed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "processing_records" ADD CONSTRAINT "processing_records_roast_preset_id_roast_presets_id_fk" FOREIGN KEY ("roast_preset_id") REFERENCES "public"."roast_presets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "roast_presets" ADD CONSTRAINT "roast_presets_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bean_lots_workspace_idx" ON "bean_lots" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "cut_tests_lot_idx" ON "cut_tests" USING btree ("lot_id");--> statement-breakpoint
CREATE INDEX "lot_costs_lot_idx" ON "lot_costs" USING btree ("lot_id");--> statement-breakpoint
CREATE INDEX "processing_records_lot_idx" ON "processing_records" USING btree ("lot_id");