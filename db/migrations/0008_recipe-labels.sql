CREATE TABLE "recipe_labels" (
	"recipe_id" uuid PRIMARY KEY NOT NULL,
	"workspace_id" uuid NOT NULL,
	"may_contain" text,
	"pieces_per_bar" integer,
	"eu_portion_grams" numeric(8, 2),
	"updated_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "recipe_labels" ADD CONSTRAINT "recipe_labels_recipe_id_recipes_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_labels" ADD CONSTRAINT "recipe_labels_workspace_id_workspaces_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspaces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recipe_labels" ADD CONSTRAINT "recipe_labels_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recipe_labels_workspace_idx" ON "recipe_labels" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "recipe_labels_updated_by_idx" ON "recipe_labels" USING btree ("updated_by_id");