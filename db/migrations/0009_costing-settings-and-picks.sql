CREATE TABLE "recipe_cost_picks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"recipe_id" uuid NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"supplier_id" uuid,
	"lot_id" uuid,
	"updated_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "recipe_cost_picks_recipe_ingredient" UNIQUE("recipe_id","ingredient_id"),
	CONSTRAINT "recipe_cost_picks_one_source" CHECK (("recipe_cost_picks"."supplier_id" is null) <> ("recipe_cost_picks"."lot_id" is null))
);
--> statement-breakpoint
CREATE TABLE "recipe_cost_settings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"recipe_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"currency" char(3) NOT NULL,
	"process_loss_percent" numeric(7, 4) DEFAULT '0' NOT NULL,
	"packaging_per_bar" numeric(16, 4) DEFAULT '0' NOT NULL,
	"labour_per_bar" numeric(16, 4) DEFAULT '0' NOT NULL,
	"labour_per_kg" numeric(16, 4) DEFAULT '0' NOT NULL,
	"overhead_per_bar" numeric(16, 4) DEFAULT '0' NOT NULL,
	"overhead_per_kg" numeric(16, 4) DEFAULT '0' NOT NULL,
	"bars_per_case" integer DEFAULT 1 NOT NULL,
	"wholesale_margin_percent" numeric(7, 4),
	"retail_margin_percent" numeric(7, 4),
	"wholesale_price_per_bar" numeric(16, 4),
	"retail_price_per_bar" numeric(16, 4),
	"batch_kg" numeric(14, 3),
	"need_within_days" integer,
	"note" text,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "recipe_cost_settings_revision" UNIQUE("recipe_id","revision")
);
--> statement-breakpoint
ALTER TABLE "workspaces" ADD COLUMN "show_costs_to_all" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_supplier_id_suppliers_id_fk" FOREIGN KEY ("supplier_id") REFERENCES "public"."suppliers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_picks" ADD CONSTRAINT "recipe_cost_picks_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_settings" ADD CONSTRAINT "recipe_cost_settings_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_settings" ADD CONSTRAINT "recipe_cost_settings_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_cost_settings" ADD CONSTRAINT "recipe_cost_settings_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recipe_cost_picks_workspace_idx" ON "recipe_cost_picks" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_picks_ingredient_idx" ON "recipe_cost_picks" USING btree ("ingredient_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_picks_supplier_idx" ON "recipe_cost_picks" USING btree ("supplier_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_picks_lot_idx" ON "recipe_cost_picks" USING btree ("lot_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_picks_updated_by_idx" ON "recipe_cost_picks" USING btree ("updated_by_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_settings_workspace_idx" ON "recipe_cost_settings" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "recipe_cost_settings_created_by_idx" ON "recipe_cost_settings" USING btree ("created_by_id");