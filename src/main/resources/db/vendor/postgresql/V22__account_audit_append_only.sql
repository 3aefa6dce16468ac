-- The account audit trail is append-only, as the list audit trail is (V12): refuse UPDATE and DELETE in
-- the database itself, so that not even a hand-written SQL session can rewrite who changed an account.
CREATE FUNCTION account_audit_refuse_change() RETURNS trigger AS $$
BEGIN
    RAISE EXCEPTION 'account_audit is append-only: % refused', TG_OP;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER account_audit_append_only
    BEFORE UPDATE OR DELETE ON account_audit
    FOR EACH ROW EXECUTE FUNCTION account_audit_refuse_change();
