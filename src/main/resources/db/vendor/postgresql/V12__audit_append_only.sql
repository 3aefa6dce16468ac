-- The audit trail is append-only: refuse UPDATE and DELETE in the database itself, so that not even
-- a hand-written SQL session can rewrite who approved what. (PostgreSQL only: H2 triggers are Java
-- classes; on the embedded default the application simply has no code path that changes a row.)
CREATE FUNCTION list_audit_refuse_change() RETURNS trigger AS $$
BEGIN
    RAISE EXCEPTION 'list_audit is append-only: % refused', TG_OP;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER list_audit_append_only
    BEFORE UPDATE OR DELETE ON list_audit
    FOR EACH ROW EXECUTE FUNCTION list_audit_refuse_change();
