#!/bin/sh
# Run once by the postgres image when its data volume is new (docker-entrypoint-initdb.d): makes the
# two roles Wayledger uses. wayledger_owner owns the database and its schema and runs the migrations;
# wayledger_app is what the application connects as: it owns nothing and gets its rights from the
# migrations (see docs/deployment-postgresql.md). Passwords come from the environment; they must not
# contain a single quote.
set -eu
psql -v ON_ERROR_STOP=1 --username "$POSTGRES_USER" --dbname "$POSTGRES_DB" <<SQL
CREATE ROLE wayledger_owner LOGIN PASSWORD '${WAYLEDGER_OWNER_PASSWORD}';
CREATE ROLE wayledger_app LOGIN PASSWORD '${WAYLEDGER_APP_PASSWORD}';
ALTER DATABASE ${POSTGRES_DB} OWNER TO wayledger_owner;
ALTER SCHEMA public OWNER TO wayledger_owner;
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
SQL
