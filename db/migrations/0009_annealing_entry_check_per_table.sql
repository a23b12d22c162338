-- PL/pgSQL resolves every field named in an IF condition, even behind a false AND, so the
-- family test must sit in its own IF: plans have no material_family column.
CREATE OR REPLACE FUNCTION refuse_foreign_guidance_entry() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  owner uuid;
  family material_family;
BEGIN
  SELECT lab_id, material_family INTO owner, family FROM annealing_guidance_entries WHERE id = NEW.guidance_entry_id;
  IF owner IS NOT NULL AND owner <> NEW.lab_id THEN
    RAISE EXCEPTION 'guidance entry % belongs to another lab', NEW.guidance_entry_id USING ERRCODE = '23503';
  END IF;
  IF TG_TABLE_NAME = 'annealing_house_cycles' THEN
    IF family <> NEW.material_family THEN
      RAISE EXCEPTION 'guidance entry % is for %, not %', NEW.guidance_entry_id, family, NEW.material_family USING ERRCODE = '23514';
    END IF;
  END IF;
  RETURN NEW;
END
$$;
