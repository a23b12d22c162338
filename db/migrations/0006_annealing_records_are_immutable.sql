-- Guidance entries, house-cycle marks, plans, runs and oven logs are records like readings:
-- corrections are superseding rows, so the same refusal applies to every one of them.
CREATE TRIGGER annealing_guidance_entries_are_immutable BEFORE UPDATE OR DELETE ON annealing_guidance_entries
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER annealing_house_cycles_are_immutable BEFORE UPDATE OR DELETE ON annealing_house_cycles
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER annealing_plans_are_immutable BEFORE UPDATE OR DELETE ON annealing_plans
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER annealing_runs_are_immutable BEFORE UPDATE OR DELETE ON annealing_runs
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER annealing_run_models_are_immutable BEFORE UPDATE OR DELETE ON annealing_run_models
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER oven_logs_are_immutable BEFORE UPDATE OR DELETE ON oven_logs
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
CREATE TRIGGER oven_log_samples_are_immutable BEFORE UPDATE OR DELETE ON oven_log_samples
  FOR EACH ROW EXECUTE FUNCTION refuse_record_change();
--> statement-breakpoint
-- A composite foreign key cannot say "published (no lab) or this lab", so a trigger does: a lab
-- may point only at shared entries and its own, never at another lab's.
CREATE FUNCTION refuse_foreign_guidance_entry() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  owner uuid;
  family material_family;
BEGIN
  SELECT lab_id, material_family INTO owner, family FROM annealing_guidance_entries WHERE id = NEW.guidance_entry_id;
  IF owner IS NOT NULL AND owner <> NEW.lab_id THEN
    RAISE EXCEPTION 'guidance entry % belongs to another lab', NEW.guidance_entry_id USING ERRCODE = '23503';
  END IF;
  IF TG_TABLE_NAME = 'annealing_house_cycles' AND family <> NEW.material_family THEN
    RAISE EXCEPTION 'guidance entry % is for %, not %', NEW.guidance_entry_id, family, NEW.material_family USING ERRCODE = '23514';
  END IF;
  RETURN NEW;
END
$$;
--> statement-breakpoint
CREATE TRIGGER annealing_house_cycles_entry_visible BEFORE INSERT ON annealing_house_cycles
  FOR EACH ROW EXECUTE FUNCTION refuse_foreign_guidance_entry();
--> statement-breakpoint
CREATE TRIGGER annealing_plans_entry_visible BEFORE INSERT ON annealing_plans
  FOR EACH ROW EXECUTE FUNCTION refuse_foreign_guidance_entry();
--> statement-breakpoint
-- Row CHECKs cannot see the previous sample; a statement trigger over the inserted logs can.
-- It re-reads whole logs, so a log inserted in several chunks is checked across chunk borders.
CREATE FUNCTION refuse_oven_time_running_backwards() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  bad record;
BEGIN
  SELECT s.log_id, s.seq, s.elapsed_h, s.previous_h INTO bad
  FROM (
    SELECT log_id, seq, elapsed_h, lag(elapsed_h) OVER (PARTITION BY log_id ORDER BY seq) AS previous_h
    FROM oven_log_samples
    WHERE log_id IN (SELECT DISTINCT log_id FROM added)
  ) s
  WHERE s.elapsed_h < s.previous_h
  LIMIT 1;
  IF FOUND THEN
    RAISE EXCEPTION 'oven log % runs backwards at sample %: % h after % h', bad.log_id, bad.seq, bad.elapsed_h, bad.previous_h
      USING ERRCODE = '23514', CONSTRAINT = 'oven_log_samples_time_non_decreasing';
  END IF;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER oven_log_samples_time_non_decreasing AFTER INSERT ON oven_log_samples
  REFERENCING NEW TABLE AS added
  FOR EACH STATEMENT EXECUTE FUNCTION refuse_oven_time_running_backwards();
