-- Where the circuits' equipment is, as a site or board default: a circuit that records no location
-- of its own takes its board's, else its site's (the finding then says so); NULL sets nothing.
-- Same words as circuit.location (V12). One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE site ADD COLUMN default_location VARCHAR(20);
ALTER TABLE board ADD COLUMN default_location VARCHAR(20);
