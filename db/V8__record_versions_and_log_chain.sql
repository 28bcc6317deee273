-- Every editable record carries its own version: load lines get theirs (sites, boards, circuits and
-- diversity methods have one already). Editing one load line moves only its own version.
ALTER TABLE load_item ADD COLUMN version BIGINT NOT NULL DEFAULT 0;

-- The change log becomes a hash chain per site (package loadlog, LogChain): each entry records its
-- place in its site's chain (site_seq, 1, 2, 3, ...), the hash of the entry before it and its own
-- hash over its fields and that previous hash, so that a changed, inserted or removed entry breaks
-- the chain where it happened. db_user is the database role that wrote the entry. On PostgreSQL a
-- trigger fills all four (and the time and user name) whatever the client sends (Java migration
-- 8.1, loadlog.ChangeLogChainMigration, which also fills them for entries written before).
ALTER TABLE change_log ADD COLUMN db_user VARCHAR(63);
ALTER TABLE change_log ADD COLUMN site_seq BIGINT;
ALTER TABLE change_log ADD COLUMN previous_hash VARCHAR(64);
ALTER TABLE change_log ADD COLUMN entry_hash VARCHAR(64);
