-- Proposal events are the signing record: append-only, refused UPDATE and DELETE at the database itself.
CREATE OR REPLACE FUNCTION refuse_proposal_event_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'proposal_events is append-only';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER proposal_events_append_only
  BEFORE UPDATE OR DELETE ON proposal_events
  FOR EACH ROW EXECUTE FUNCTION refuse_proposal_event_change();
