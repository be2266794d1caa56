-- An approved redesign is the record the winder winds from: the database itself refuses to change or
-- delete it. A change is a new revision (a new row), which goes through approval again.
CREATE OR REPLACE FUNCTION "coilwright_refuse_approved_redesign_change"() RETURNS trigger AS $$
BEGIN
  IF OLD."status" = 'APPROVED' THEN
    RAISE EXCEPTION 'Redesign revision % of job % is approved and frozen; make a new revision instead.', OLD."revision", OLD."jobId"
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  IF TG_OP = 'DELETE' THEN
    RETURN OLD;
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;

CREATE TRIGGER "Redesign_frozen_when_approved"
  BEFORE UPDATE OR DELETE ON "Redesign"
  FOR EACH ROW EXECUTE FUNCTION "coilwright_refuse_approved_redesign_change"();
