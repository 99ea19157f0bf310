-- Cost settings are history (each change is a new revision): the database
-- refuses to change a revision once written. barwright_refuse_update() comes
-- from 0005.
CREATE TRIGGER recipe_cost_settings_insert_only BEFORE UPDATE ON recipe_cost_settings FOR EACH ROW EXECUTE FUNCTION barwright_refuse_update();
