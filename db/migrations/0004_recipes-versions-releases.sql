CREATE TYPE "public"."chocolate_type" AS ENUM('dark', 'milk', 'white', 'other');--> statement-breakpoint
CREATE TYPE "public"."recipe_origin" AS ENUM('scratch', 'starting_point', 'copy');--> statement-breakpoint
CREATE TABLE "recipe_releases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"recipe_id" uuid NOT NULL,
	"version_id" uuid NOT NULL,
	"version_no" integer NOT NULL,
	"note" text,
	"released_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "recipe_version_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"ingredient_id" uuid NOT NULL,
	"percent" numeric(9, 4) NOT NULL,
	"ingredient_name" text NOT NULL,
	"cocoa_butter" numeric(8, 4) NOT NULL,
	"cocoa_solids_non_fat" numeric(8, 4) NOT NULL,
	"milk_fat" numeric(8, 4) NOT NULL,
	"milk_solids_non_fat" numeric(8, 4) NOT NULL,
	"sugar" numeric(8, 4) NOT NULL,
	"vegetable_fat" numeric(8, 4) NOT NULL,
	"moisture" numeric(8, 4) NOT NULL,
	"is_inclusion" boolean NOT NULL,
	"allergens" text[] NOT NULL,
	"price_per_kg" numeric(16, 4),
	CONSTRAINT "recipe_version_lines_position" UNIQUE("version_id","position")
);
--> statement-breakpoint
CREATE TABLE "recipe_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"recipe_id" uuid NOT NULL,
	"version_no" integer NOT NULL,
	"based_on_version_no" integer,
	"restored_from_version_no" integer,
	"note" text,
	"author_id" uuid,
	"bar_mass_grams" numeric(8, 2) NOT NULL,
	"cocoa_percent" numeric(9, 4) NOT NULL,
	"cost_per_kg" numeric(16, 4),
	"cost_per_bar" numeric(16, 4),
	"evaluation" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "recipe_versions_recipe_version" UNIQUE("recipe_id","version_no")
);
--> statement-breakpoint
CREATE TABLE "recipes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"chocolate_type" "chocolate_type" NOT NULL,
	"target_cocoa_percent" numeric(9, 4),
	"notes" text,
	"origin" "recipe_origin" DEFAULT 'scratch' NOT NULL,
	"starting_point_key" text,
	"copied_from_recipe_id" uuid,
	"copied_from_version_no" integer,
	"created_by_id" uuid,
	"latest_version_no" integer DEFAULT 0 NOT NULL,
	"bar_mass_grams" numeric(8, 2) NOT NULL,
	"cocoa_percent" numeric(9, 4),
	"cost_per_bar" numeric(16, 4),
	"released_version_no" integer,
	"released_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "recipes_workspace_name" UNIQUE("workspace_id","name")
);
--> statement-breakpoint
ALTER TABLE "recipe_releases" ADD CONSTRAINT "recipe_releases_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_releases" ADD CONSTRAINT "recipe_releases_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_releases" ADD CONSTRAINT "recipe_releases_version_id_recipe_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recipe_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_releases" ADD CONSTRAINT "recipe_releases_released_by_id_users_id_fk" FOREIGN KEY ("released_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_version_lines" ADD CONSTRAINT "recipe_version_lines_version_id_recipe_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recipe_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_version_lines" ADD CONSTRAINT "recipe_version_lines_ingredient_id_ingredients_id_fk" FOREIGN KEY ("ingredient_id") REFERENCES "public"."ingredients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_versions" ADD CONSTRAINT "recipe_versions_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_versions" ADD CONSTRAINT "recipe_versions_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_versions" ADD CONSTRAINT "recipe_versions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipes" ADD CONSTRAINT "recipes_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipes" ADD CONSTRAINT "recipes_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recipe_releases_recipe_idx" ON "recipe_releases" USING btree ("recipe_id","created_at");--> statement-breakpoint
CREATE INDEX "recipe_releases_version_idx" ON "recipe_releases" USING btree ("version_id");--> statement-breakpoint
CREATE INDEX "recipe_releases_workspace_idx" ON "recipe_releases" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "recipe_version_lines_ingredient_idx" ON "recipe_version_lines" USING btree ("ingredient_id");--> statement-breakpoint
CREATE INDEX "recipe_versions_workspace_idx" ON "recipe_versions" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "recipe_versions_author_idx" ON "recipe_versions" USING btree ("author_id");--> statement-breakpoint
CREATE INDEX "recipes_workspace_name_idx" ON "recipes" USING btree ("workspace_id",lower("name"),"id");--> statement-breakpoint
CREATE INDEX "recipes_workspace_updated_idx" ON "recipes" USING btree ("workspace_id","updated_at","id");--> statement-breakpoint
CREATE INDEX "recipes_workspace_cocoa_idx" ON "recipes" USING btree ("workspace_id","cocoa_percent","id");--> statement-breakpoint
CREATE INDEX "recipes_workspace_cost_idx" ON "recipes" USING btree ("workspace_id","cost_per_bar","id");--> statement-breakpoint
CREATE INDEX "recipes_created_by_idx" ON "recipes" USING btree ("created_by_id");