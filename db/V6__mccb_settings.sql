-- Moulded-case breaker settings: Ir (overload / long-time setting) and Ii (instantaneous pick-up), both in A.
-- Kept only for a device of kind MCCB (the application leaves them null otherwise). An MCCB without them is
-- checked with the engine's standard assumption (Ir = In, Ii = 10·In) and the finding says so.
-- One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE circuit ADD COLUMN device_overload_setting_amps DOUBLE PRECISION
    CHECK (device_overload_setting_amps > 0);
ALTER TABLE circuit ADD COLUMN device_instantaneous_setting_amps DOUBLE PRECISION
    CHECK (device_instantaneous_setting_amps > 0);
ALTER TABLE board ADD COLUMN incomer_overload_setting_amps DOUBLE PRECISION
    CHECK (incomer_overload_setting_amps > 0);
ALTER TABLE board ADD COLUMN incomer_instantaneous_setting_amps DOUBLE PRECISION
    CHECK (incomer_instantaneous_setting_amps > 0);
