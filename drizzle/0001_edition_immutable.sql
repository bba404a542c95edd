-- Editions are frozen once published: reject every UPDATE and DELETE, even from raw SQL.
CREATE OR REPLACE FUNCTION vierbein_reject_edition_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'editions are immutable (% rejected)', TG_OP USING ERRCODE = 'integrity_constraint_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER editions_immutable
  BEFORE UPDATE OR DELETE ON "editions"
  FOR EACH ROW EXECUTE FUNCTION vierbein_reject_edition_change();
--> statement-breakpoint
CREATE TRIGGER editions_no_truncate
  BEFORE TRUNCATE ON "editions"
  FOR EACH STATEMENT EXECUTE FUNCTION vierbein_reject_edition_change();
