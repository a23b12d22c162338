-- Calibrations and acceptance limits are records too: corrections and changes are new rows.
CREATE TRIGGER calibrations_are_immutable BEFORE UPDATE OR DELETE ON calibrations
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER acceptance_criteria_are_immutable BEFORE UPDATE OR DELETE ON acceptance_criteria
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
