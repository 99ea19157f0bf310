CREATE TYPE "public"."ingredient_kind" AS ENUM('nibs', 'cocoa_liquor', 'cocoa_butter', 'cocoa_powder', 'sugar', 'milk_powder', 'lecithin', 'flavouring', 'inclusion', 'other');--> statement-breakpoint
CREATE TYPE "public"."price_unit" AS ENUM('per_kg', 'per_pack', 'per_tonne');--> statement-breakpoint
CREATE TABLE "suppliers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"contact_name" text,
	"email" text,
	"currency" char(3) NOT NULL,
	"lead_time_days" integer,
	"notes" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "suppliers_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
CREATE TABLE "ingredients" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "ingredient_kind" NOT NULL,
	"cocoa_butter" numeric(8, 4) DEFAULT '0' NOT NULL,
	"cocoa_solids_non_fat" numeric(8, 4) DEFAULT '0' NOT NULL,
	"milk_fat" numeric(8, 4) DEFAULT '0' NOT NULL,
	"milk_solids_non_fat" numeric(8, 4) DEFAULT '0' NOT NULL,
	"sugar" numeric(8, 4) DEFAULT '0' NOT NULL,
	"vegetable_fat" numeric(8, 4) DEFAULT '0' NOT NULL,
	"moisture" numeric(8, 4) DEFAULT '0' NOT NULL,
	"is_inclusion" boolean DEFAULT false NOT NULL,
	"fat" numeric(8, 4),
	"saturated_fat" numeric(8, 4),
	"carbohydrate" numeric(8, 4),
	"sugars" numeric(8, 4),
	"fibre" numeric(8, 4),
	"protein" numeric(8, 4),
	"salt" numeric(8, 4),
	"ash" numeric(8, 4),
	"allergens" text[] DEFAULT '{}' NOT NULL,
	"source" text,
	"reference_key" text,
	"preferred_supplier_id" uuid,
	"notes" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "ingredients_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
CREATE TABLE "exchange_rates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"currency" char(3) NOT NULL,
	"rate_to_base" numeric(20, 10) NOT NULL,
	"valid_on" date NOT NULL,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "exchange_rates_workspace_currency_day" UNIQUE("workspace_id","currency","valid_on")
);
--> statement-breakpoint
CREATE TABLE "price_quotes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"supplier_id" uuid NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"price" numeric(16, 4) NOT NULL,
	"currency" char(3) NOT NULL,
	"unit" "price_unit" NOT NULL,
	"pack_kg" numeric(14, 3),
	"minimum_order_kg" numeric(14, 3),
	"valid_from" date NOT NULL,
	"valid_until" date,
	"source" text DEFAULT 'manual' NOT NULL,
	"dedupe_key" text NOT NULL,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "price_quotes_workspace_dedupe" UNIQUE("workspace_id","dedupe_key")
);
--> statement-breakpoint
ALTER TABLE "suppliers" ADD CONSTRAINT "suppliers_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ingredients" ADD CONSTRAINT "ingredients_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ingredients" ADD CONSTRAINT "ingredients_preferred_supplier_id_suppliers_id_fk" FOREIGN KEY ("preferred_supplier_id") REFERENCES "public"."suppliers"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "exchange_rates" ADD CONSTRAINT "exchange_rates_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "exchange_rates" ADD CONSTRAINT "exchange_rates_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_quotes" ADD CONSTRAINT "price_quotes_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_quotes" ADD CONSTRAINT "price_quotes_supplier_id_suppliers_id_fk" FOREIGN KEY ("supplier_id") REFERENCES "public"."suppliers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_quotes" ADD CONSTRAINT "price_quotes_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_quotes" ADD CONSTRAINT "price_quotes_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "suppliers_workspace_idx" ON "suppliers" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "ingredients_workspace_idx" ON "ingredients" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "ingredients_preferred_supplier_idx" ON "ingredients" USING btree ("preferred_supplier_id");--> statement-breakpoint
CREATE INDEX "price_quotes_ingredient_idx" ON "price_quotes" USING btree ("ingredient_id","valid_from");--> statement-breakpoint
CREATE INDEX "price_quotes_supplier_idx" ON "price_quotes" USING btree ("supplier_id");