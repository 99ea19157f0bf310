CREATE TYPE "public"."batch_mass_unit" AS ENUM('g', 'kg', 't', 'bars');--> statement-breakpoint
CREATE TYPE "public"."batch_status" AS ENUM('planned', 'completed', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."machine_kind" AS ENUM('refiner', 'conche', 'tempering');--> statement-breakpoint
CREATE TYPE "public"."purchase_order_status" AS ENUM('drafted', 'sent', 'received', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."stock_movement_kind" AS ENUM('opening', 'received', 'used');--> statement-breakpoint
CREATE TABLE "batch_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"batch_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"ingredient_name" text NOT NULL,
	"ingredient_kind" "ingredient_kind" NOT NULL,
	"percent" numeric(9, 4) NOT NULL,
	"mass_grams" numeric(18, 3) NOT NULL,
	"allergens" text[] NOT NULL,
	CONSTRAINT "batch_lines_position" UNIQUE("batch_id","position")
);
--> statement-breakpoint
CREATE TABLE "batches" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"code" text NOT NULL,
	"recipe_id" uuid NOT NULL,
	"version_id" uuid NOT NULL,
	"version_no" integer NOT NULL,
	"recipe_name" text NOT NULL,
	"chocolate_type" "chocolate_type" NOT NULL,
	"bar_mass_grams" numeric(8, 2) NOT NULL,
	"planned_for" date NOT NULL,
	"requested_amount" numeric(18, 3) NOT NULL,
	"requested_unit" "batch_mass_unit" NOT NULL,
	"requested_mass_grams" numeric(18, 3) NOT NULL,
	"total_mass_grams" numeric(18, 3) NOT NULL,
	"resolution_grams" numeric(10, 3) NOT NULL,
	"station_id" uuid,
	"station_name" text NOT NULL,
	"station_capacity_kg" numeric(14, 3),
	"machine_id" uuid,
	"machine_name" text,
	"machine_capacity_kg" numeric(14, 3),
	"load_count" integer NOT NULL,
	"loads" jsonb NOT NULL,
	"scale_notes" jsonb NOT NULL,
	"roast_preset_name" text,
	"roast_temperature_c" numeric(6, 1),
	"roast_minutes" numeric(6, 1),
	"refining_hours" numeric(6, 1),
	"conching_hours" numeric(6, 1),
	"notes" text,
	"status" "batch_status" DEFAULT 'planned' NOT NULL,
	"created_by_id" uuid,
	"cancelled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "batches_workspace_code" UNIQUE("workspace_id","code")
);
--> statement-breakpoint
CREATE TABLE "machines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "machine_kind" NOT NULL,
	"capacity_kg" numeric(14, 3) NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "machines_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
CREATE TABLE "production_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"batch_id" uuid NOT NULL,
	"started_at" timestamp with time zone NOT NULL,
	"ended_at" timestamp with time zone NOT NULL,
	"tolerance_percent" numeric(6, 3) NOT NULL,
	"notes" text,
	"recorded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "production_runs_batch" UNIQUE("batch_id")
);
--> statement-breakpoint
CREATE TABLE "run_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"run_id" uuid NOT NULL,
	"batch_line_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"actual_grams" numeric(18, 3) NOT NULL,
	"lot_code" text,
	"lot_id" uuid,
	"consumes_nibs" boolean DEFAULT false NOT NULL,
	CONSTRAINT "run_lines_position" UNIQUE("run_id","position")
);
--> statement-breakpoint
CREATE TABLE "weighing_stations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"resolution_grams" numeric(10, 3) NOT NULL,
	"capacity_kg" numeric(14, 3),
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "weighing_stations_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
CREATE TABLE "purchase_order_batches" (
	"order_id" uuid NOT NULL,
	"batch_id" uuid NOT NULL,
	CONSTRAINT "purchase_order_batches_order_id_batch_id_pk" PRIMARY KEY("order_id","batch_id")
);
--> statement-breakpoint
CREATE TABLE "purchase_order_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"ingredient_name" text NOT NULL,
	"needed_kg" numeric(14, 3) NOT NULL,
	"quantity_kg" numeric(14, 3) NOT NULL,
	"pack_kg" numeric(14, 3),
	"packs" integer,
	"minimum_order_kg" numeric(14, 3),
	"price" numeric(16, 4),
	"currency" char(3),
	"price_unit" "price_unit",
	"quote_id" uuid,
	CONSTRAINT "purchase_order_lines_position" UNIQUE("order_id","position")
);
--> statement-breakpoint
CREATE TABLE "purchase_orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"number" text NOT NULL,
	"supplier_id" uuid NOT NULL,
	"status" "purchase_order_status" DEFAULT 'drafted' NOT NULL,
	"notes" text,
	"created_by_id" uuid,
	"sent_at" timestamp with time zone,
	"sent_to" text,
	"received_on" date,
	"cancelled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "purchase_orders_workspace_number" UNIQUE("workspace_id","number")
);
--> statement-breakpoint
CREATE TABLE "stock_movements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"kind" "stock_movement_kind" NOT NULL,
	"mass_kg" numeric(14, 3) NOT NULL,
	"order_id" uuid,
	"run_id" uuid,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "batch_lines" ADD CONSTRAINT "batch_lines_batch_id_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."batches"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batch_lines" ADD CONSTRAINT "batch_lines_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_version_id_recipe_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recipe_versions"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_station_id_weighing_stations_id_fk" FOREIGN KEY ("station_id") REFERENCES "public"."weighing_stations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "batches" ADD CONSTRAINT "batches_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "production_runs" ADD CONSTRAINT "production_runs_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "production_runs" ADD CONSTRAINT "production_runs_batch_id_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."batches"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "production_runs" ADD CONSTRAINT "production_runs_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_lines" ADD CONSTRAINT "run_lines_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_lines" ADD CONSTRAINT "run_lines_run_id_production_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."production_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_lines" ADD CONSTRAINT "run_lines_batch_line_id_batch_lines_id_fk" FOREIGN KEY ("batch_line_id") REFERENCES "public"."batch_lines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_lines" ADD CONSTRAINT "run_lines_lot_id_bean_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."bean_lots"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "weighing_stations" ADD CONSTRAINT "weighing_stations_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_batches" ADD CONSTRAINT "purchase_order_batches_order_id_purchase_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."purchase_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_batches" ADD CONSTRAINT "purchase_order_batches_batch_id_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."batches"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_order_id_purchase_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."purchase_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_quote_id_price_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."price_quotes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_supplier_id_suppliers_id_fk" FOREIGN KEY ("supplier_id") REFERENCES "public"."suppliers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_order_id_purchase_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."purchase_orders"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_run_id_production_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."production_runs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "batch_lines_ingredient_idx" ON "batch_lines" USING btree ("ingredient_id");--> statement-breakpoint
CREATE INDEX "batches_workspace_created_idx" ON "batches" USING btree ("workspace_id","created_at");--> statement-breakpoint
CREATE INDEX "batches_recipe_idx" ON "batches" USING btree ("recipe_id");--> statement-breakpoint
CREATE INDEX "batches_version_idx" ON "batches" USING btree ("version_id");--> statement-breakpoint
CREATE INDEX "machines_workspace_idx" ON "machines" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "production_runs_workspace_idx" ON "production_runs" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "run_lines_lot_idx" ON "run_lines" USING btree ("lot_id");--> statement-breakpoint
CREATE INDEX "run_lines_batch_line_idx" ON "run_lines" USING btree ("batch_line_id");--> statement-breakpoint
CREATE INDEX "weighing_stations_workspace_idx" ON "weighing_stations" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "purchase_order_batches_batch_idx" ON "purchase_order_batches" USING btree ("batch_id");--> statement-breakpoint
CREATE INDEX "purchase_order_lines_ingredient_idx" ON "purchase_order_lines" USING btree ("ingredient_id");--> statement-breakpoint
CREATE INDEX "purchase_orders_workspace_idx" ON "purchase_orders" USING btree ("workspace_id","created_at");--> statement-breakpoint
CREATE INDEX "purchase_orders_supplier_idx" ON "purchase_orders" USING btree ("supplier_id");--> statement-breakpoint
CREATE INDEX "stock_movements_ingredient_idx" ON "stock_movements" USING btree ("workspace_id","ingredient_id");