-- Any change to a welder's tests or continuity marks that welder × process for recomputation.
CREATE OR REPLACE FUNCTION mark_standing_refresh() RETURNS trigger AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    INSERT INTO standing_refresh (welder_id, process) VALUES (OLD.welder_id, OLD.process) ON CONFLICT DO NOTHING;
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    INSERT INTO standing_refresh (welder_id, process) VALUES (NEW.welder_id, NEW.process) ON CONFLICT DO NOTHING;
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER continuity_entries_standing AFTER INSERT OR UPDATE OR DELETE ON continuity_entries
  FOR EACH ROW EXECUTE FUNCTION mark_standing_refresh();
--> statement-breakpoint
CREATE TRIGGER welder_tests_standing AFTER INSERT OR UPDATE OR DELETE ON welder_tests
  FOR EACH ROW EXECUTE FUNCTION mark_standing_refresh();
--> statement-breakpoint
-- Records made before this migration are marked once, so the first read computes them.
INSERT INTO standing_refresh (welder_id, process)
  SELECT DISTINCT welder_id, process FROM welder_tests ON CONFLICT DO NOTHING;
