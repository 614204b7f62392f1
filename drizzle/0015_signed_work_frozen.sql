-- Signed stays signed (issue 14): once a homeowner accepts, the released design option and the
-- accepted proposal revision are read-only at the database itself, whatever code writes to them.
-- Changes to signed work go through change orders. SQLSTATE 23001 (restrict_violation) lets the
-- API answer 409 should a write ever get this far.
CREATE OR REPLACE FUNCTION refuse_released_option_change() RETURNS trigger AS $$
BEGIN
  IF OLD.released_at IS NOT NULL THEN
    RAISE EXCEPTION 'design option % was accepted (signed work is read-only); draft a change order instead', OLD.id
      USING ERRCODE = 'restrict_violation';
  END IF;
  IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER design_options_signed_frozen
  BEFORE UPDATE OR DELETE ON design_options
  FOR EACH ROW EXECUTE FUNCTION refuse_released_option_change();
--> statement-breakpoint
-- On an accepted revision only the PDFs still being drawn (each set once), the link's state, the
-- reminder and bookkeeping columns may change.
CREATE OR REPLACE FUNCTION refuse_accepted_proposal_change() RETURNS trigger AS $$
BEGIN
  IF OLD.status = 'accepted' AND (
    TG_OP = 'DELETE'
    OR NEW.status IS DISTINCT FROM OLD.status
    OR NEW.snapshot IS DISTINCT FROM OLD.snapshot
    OR NEW.snapshot_sha256 IS DISTINCT FROM OLD.snapshot_sha256
    OR NEW.crew_plans IS DISTINCT FROM OLD.crew_plans
    OR NEW.acceptance IS DISTINCT FROM OLD.acceptance
    OR NEW.option_ids IS DISTINCT FROM OLD.option_ids
    OR NEW.scopes IS DISTINCT FROM OLD.scopes
    OR NEW.photo_ids IS DISTINCT FROM OLD.photo_ids
    OR NEW.finding_codes IS DISTINCT FROM OLD.finding_codes
    OR NEW.cover_note IS DISTINCT FROM OLD.cover_note
    OR NEW.terms IS DISTINCT FROM OLD.terms
    OR NEW.deposit_rule IS DISTINCT FROM OLD.deposit_rule
    OR NEW.valid_until IS DISTINCT FROM OLD.valid_until
    OR NEW.decided_at IS DISTINCT FROM OLD.decided_at
    OR NEW.revision IS DISTINCT FROM OLD.revision
    OR NEW.series_id IS DISTINCT FROM OLD.series_id
    OR NEW.project_id IS DISTINCT FROM OLD.project_id
    OR NEW.company_id IS DISTINCT FROM OLD.company_id
    OR NEW.seller_user_id IS DISTINCT FROM OLD.seller_user_id
    OR NEW.superseded_by IS DISTINCT FROM OLD.superseded_by
    OR (OLD.pdf_sha256 IS NOT NULL AND NEW.pdf_sha256 IS DISTINCT FROM OLD.pdf_sha256)
    OR (OLD.signed_pdf_sha256 IS NOT NULL AND NEW.signed_pdf_sha256 IS DISTINCT FROM OLD.signed_pdf_sha256)
  ) THEN
    RAISE EXCEPTION 'proposal % was accepted (signed work is read-only); draft a change order instead', OLD.id
      USING ERRCODE = 'restrict_violation';
  END IF;
  IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER proposals_signed_frozen
  BEFORE UPDATE OR DELETE ON proposals
  FOR EACH ROW EXECUTE FUNCTION refuse_accepted_proposal_change();
