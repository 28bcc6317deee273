-- Ring final circuits: a circuit whose cable leaves the board and returns to it (the UK socket-outlet ring).
-- The protection checks treat a ring differently from a radial (see docs/calculations/protection.md).
-- One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE circuit ADD COLUMN ring_final BOOLEAN NOT NULL DEFAULT FALSE;
