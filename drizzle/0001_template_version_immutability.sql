-- A version that has left draft (published, later perhaps deprecated) is frozen: its spec,
-- content hash, semver and template never change, it never returns to draft, and it is never
-- deleted. Results are cached by content hash, so the spec behind a hash must stay put.
-- Only status (published -> deprecated) and the changelog text may still change.
CREATE FUNCTION "template_versions_guard_frozen"() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF OLD.status <> 'draft' THEN
      RAISE EXCEPTION 'template version % (%) is %, and a published version cannot be deleted',
        OLD.id, OLD.semver, OLD.status
        USING ERRCODE = 'restrict_violation', HINT = 'Deprecate it instead.';
    END IF;
    RETURN OLD;
  END IF;

  IF OLD.status <> 'draft' THEN
    IF NEW.spec IS DISTINCT FROM OLD.spec
       OR NEW.content_hash IS DISTINCT FROM OLD.content_hash
       OR NEW.semver IS DISTINCT FROM OLD.semver
       OR NEW.template_id IS DISTINCT FROM OLD.template_id
       OR NEW.published_at IS DISTINCT FROM OLD.published_at THEN
      RAISE EXCEPTION 'template version % (%) is %, and its spec, content hash, semver, template and publication time cannot change',
        OLD.id, OLD.semver, OLD.status
        USING ERRCODE = 'restrict_violation', HINT = 'Publish a new version instead.';
    END IF;
    IF NEW.status = 'draft' THEN
      RAISE EXCEPTION 'template version % (%) is %, and cannot return to draft',
        OLD.id, OLD.semver, OLD.status
        USING ERRCODE = 'restrict_violation', HINT = 'Publish a new version instead.';
    END IF;
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER "template_versions_frozen_update"
  BEFORE UPDATE ON "template_versions"
  FOR EACH ROW EXECUTE FUNCTION "template_versions_guard_frozen"();
--> statement-breakpoint
CREATE TRIGGER "template_versions_frozen_delete"
  BEFORE DELETE ON "template_versions"
  FOR EACH ROW EXECUTE FUNCTION "template_versions_guard_frozen"();
