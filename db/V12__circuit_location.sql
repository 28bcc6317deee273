-- Where a circuit's equipment is (indoors, outdoors, a room with a bath or shower, a pool, a sauna),
-- for the residual-current rules; NULL when not recorded, which the check reports as not assessed.
-- A plain column on the schedule's table: the application's role already reads and writes it.
-- One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE circuit ADD COLUMN location VARCHAR(20);
