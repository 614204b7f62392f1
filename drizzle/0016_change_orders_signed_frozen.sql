-- A change order is edited only as a draft. Once sent, what the homeowner reads is frozen; once
-- signed or declined, nothing about it changes and it cannot be deleted (issue 14). SQLSTATE
-- 23001 as for migration 0015, so the API answers 409.
CREATE OR REPLACE FUNCTION refuse_sent_change_order_change() RETURNS trigger AS $$
BEGIN
  IF OLD.status = 'draft' THEN
    IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
    RETURN NEW;
  END IF;
  IF TG_OP = 'DELETE'
    OR OLD.status IN ('signed', 'declined')
    OR NEW.status NOT IN ('sent', 'signed', 'declined')
    OR NEW.snapshot IS DISTINCT FROM OLD.snapshot
    OR NEW.snapshot_sha256 IS DISTINCT FROM OLD.snapshot_sha256
    OR NEW.lines IS DISTINCT FROM OLD.lines
    OR NEW.reason IS DISTINCT FROM OLD.reason
    OR NEW.photo_ids IS DISTINCT FROM OLD.photo_ids
    OR NEW.number IS DISTINCT FROM OLD.number
    OR NEW.token_hash IS DISTINCT FROM OLD.token_hash
    OR NEW.proposal_id IS DISTINCT FROM OLD.proposal_id
    OR (OLD.pdf_sha256 IS NOT NULL AND NEW.pdf_sha256 IS DISTINCT FROM OLD.pdf_sha256)
  THEN
    RAISE EXCEPTION 'change order % was sent (signed work is read-only); draft a new change order instead', OLD.id
      USING ERRCODE = 'restrict_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER change_orders_signed_frozen
  BEFORE UPDATE OR DELETE ON change_orders
  FOR EACH ROW EXECUTE FUNCTION refuse_sent_change_order_change();
