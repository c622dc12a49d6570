-- Every write to an input of a stored analysis moves a revision counter, so that reading the analysis can
-- tell from two numbers whether the stored result may be stale: shows.inputs_revision for the show-wide
-- inputs (the show's conditions and targets, roster, listening points, phrases and their voicing, set order,
-- the program's catalog), sets.inputs_revision for the set's positions. Triggers, not application code, so
-- that no write path can forget; a stale-looking result is still checked against its inputs hash before
-- it is recomputed, so an extra bump costs one slow read, never a wrong answer.

-- Any change to the show row itself (conditions, targets, field rules).
CREATE FUNCTION farfield_show_row_revision() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.inputs_revision = OLD.inputs_revision THEN
    NEW.inputs_revision := OLD.inputs_revision + 1;
  END IF;
  RETURN NEW;
END $$;
--> statement-breakpoint
CREATE TRIGGER shows_inputs_revision BEFORE UPDATE ON shows
  FOR EACH ROW EXECUTE FUNCTION farfield_show_row_revision();
--> statement-breakpoint

-- Row triggers below name OLD and NEW together: the one an operation lacks is NULL and matches nothing.

-- Rows that carry their show's id.
CREATE FUNCTION farfield_bump_show_of_row() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE shows SET inputs_revision = inputs_revision + 1 WHERE id IN (OLD.show_id, NEW.show_id);
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER performers_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON performers
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_row();
--> statement-breakpoint
CREATE TRIGGER listening_points_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON listening_points
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_row();
--> statement-breakpoint
CREATE TRIGGER phrases_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON phrases
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_row();
--> statement-breakpoint
-- Set order decides which phrase a set belongs to; a set's own revision moving must not touch the show.
CREATE TRIGGER sets_inputs_revision AFTER INSERT OR DELETE OR UPDATE OF "order", show_id ON sets
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_row();
--> statement-breakpoint

-- Rows that belong to a phrase: voice assignments and performer overrides.
CREATE FUNCTION farfield_bump_show_of_phrase_row() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE shows SET inputs_revision = inputs_revision + 1
    WHERE id IN (SELECT show_id FROM phrases WHERE id IN (OLD.phrase_id, NEW.phrase_id));
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER voice_assignments_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON voice_assignments
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_phrase_row();
--> statement-breakpoint
CREATE TRIGGER performer_overrides_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON performer_overrides
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_show_of_phrase_row();
--> statement-breakpoint

-- The catalog in force is the program's: every show of the program.
CREATE FUNCTION farfield_bump_shows_of_program() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE shows SET inputs_revision = inputs_revision + 1 WHERE program_id IN (OLD.program_id, NEW.program_id);
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER instrument_catalogs_inputs_revision AFTER INSERT OR UPDATE OR DELETE ON instrument_catalogs
  FOR EACH ROW EXECUTE FUNCTION farfield_bump_shows_of_program();
--> statement-breakpoint

-- Positions: once per statement, since a save replaces hundreds of rows at a time.
CREATE FUNCTION farfield_bump_sets_of_positions() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    UPDATE sets SET inputs_revision = inputs_revision + 1 WHERE id IN (SELECT set_id FROM new_rows);
  ELSIF TG_OP = 'DELETE' THEN
    UPDATE sets SET inputs_revision = inputs_revision + 1 WHERE id IN (SELECT set_id FROM old_rows);
  ELSE
    UPDATE sets SET inputs_revision = inputs_revision + 1
      WHERE id IN (SELECT set_id FROM new_rows UNION SELECT set_id FROM old_rows);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER positions_inserted_revision AFTER INSERT ON positions
  REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION farfield_bump_sets_of_positions();
--> statement-breakpoint
CREATE TRIGGER positions_updated_revision AFTER UPDATE ON positions
  REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION farfield_bump_sets_of_positions();
--> statement-breakpoint
CREATE TRIGGER positions_deleted_revision AFTER DELETE ON positions
  REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION farfield_bump_sets_of_positions();
