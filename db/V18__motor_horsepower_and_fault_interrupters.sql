-- NEC checks: a motor load's rated horsepower (NEC Tables 430.248/430.250 are read by it; NULL when
-- not recorded, which the motor checks report as not assessed) and a breaker's ground-fault or
-- arc-fault function (GFCI, AFCI or dual function; NULL for none). Circuit locations gain the NEC
-- dwelling locations in the existing VARCHAR(20) column, which has no constraint to widen.
-- One script for PostgreSQL and H2 in PostgreSQL mode.

ALTER TABLE load_item ADD COLUMN motor_horsepower DOUBLE PRECISION
    CHECK (motor_horsepower > 0);
ALTER TABLE circuit ADD COLUMN device_fault_interrupter VARCHAR(16)
    CHECK (device_fault_interrupter IN ('GFCI', 'AFCI', 'DUAL_FUNCTION'));
