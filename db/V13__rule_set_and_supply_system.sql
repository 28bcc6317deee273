-- North American installations: the rule set a site is checked against and the geometry of its
-- supply. Every existing site keeps the IEC 60364 / BS 7671 set and the IEC wye (U0 and phases as
-- recorded, lines at 0°, −120°, +120°). One script for PostgreSQL and H2 (PostgreSQL mode).
-- A two-pole (line-to-line) circuit keeps its first line in circuit.position and sets line_to_line:
-- L1 with line_to_line is L1–L2, L2 is L2–L3, L3 is L3–L1 (the lines a two-pole breaker takes in
-- their fixed order); its second line's way_slot row holds it there.

ALTER TABLE site ADD COLUMN rule_set VARCHAR(12) NOT NULL DEFAULT 'IEC';
ALTER TABLE site ADD COLUMN supply_system VARCHAR(24) NOT NULL DEFAULT 'IEC_WYE';
ALTER TABLE site ADD CONSTRAINT site_rule_set_known CHECK (rule_set IN ('IEC', 'NEC'));
ALTER TABLE site ADD CONSTRAINT site_supply_system_known
    CHECK (supply_system IN ('IEC_WYE', 'SPLIT_PHASE_120_240', 'WYE_208Y_120', 'WYE_480Y_277'));
ALTER TABLE site ADD CONSTRAINT site_supply_system_of_rule_set
    CHECK ((rule_set = 'IEC' AND supply_system = 'IEC_WYE') OR (rule_set = 'NEC' AND supply_system <> 'IEC_WYE'));

ALTER TABLE circuit ADD COLUMN line_to_line BOOLEAN NOT NULL DEFAULT FALSE;
ALTER TABLE circuit ADD CONSTRAINT circuit_line_to_line_single_line
    CHECK (line_to_line = FALSE OR position IN ('L1', 'L2', 'L3'));
