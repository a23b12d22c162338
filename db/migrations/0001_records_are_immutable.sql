-- Readings and model events are original observations (ISO/IEC 17025 clause 7.5): never edited
-- or deleted. Corrections are new rows that supersede old ones, so both stay queryable.
CREATE FUNCTION refuse_record_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% on % is not allowed: records are amended by a superseding row, never changed', TG_OP, TG_TABLE_NAME
    USING ERRCODE = 'FL001';
END
$$;
--> statement-breakpoint
CREATE TRIGGER readings_are_immutable BEFORE UPDATE OR DELETE ON readings
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER model_events_are_immutable BEFORE UPDATE OR DELETE ON model_events
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER reading_imports_are_immutable BEFORE UPDATE OR DELETE ON reading_imports
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
