-- NEC voltage drop: the conduit a circuit's conductors run in (NEC Chapter 9 Table 9 has a column for
-- PVC, aluminum and steel conduit); NULL when not recorded, which the check reports by taking the
-- conduit of the highest impedance. Stored with the circuit's own version (an edit of the circuit).
-- One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE circuit ADD COLUMN cable_conduit VARCHAR(10)
    CHECK (cable_conduit IN ('PVC', 'ALUMINUM', 'STEEL'));
