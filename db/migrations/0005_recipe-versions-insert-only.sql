-- Versions, their lines and release records are history: the database itself
-- refuses to change them. (Deleting follows only from deleting the workspace
-- or recipe, by cascade.)
CREATE FUNCTION barwright_refuse_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'rows of % are insert-only', TG_TABLE_NAME USING ERRCODE = 'restrict_violation';
END;
$$;--> statement-breakpoint
CREATE TRIGGER recipe_versions_insert_only BEFORE UPDATE ON recipe_versions FOR EACH ROW EXECUTE FUNCTION barwright_refuse_update();--> statement-breakpoint
CREATE TRIGGER recipe_version_lines_insert_only BEFORE UPDATE ON recipe_version_lines FOR EACH ROW EXECUTE FUNCTION barwright_refuse_update();--> statement-breakpoint
CREATE TRIGGER recipe_releases_insert_only BEFORE UPDATE ON recipe_releases FOR EACH ROW EXECUTE FUNCTION barwright_refuse_update();
