-- A board's own supply system: a second service of the site (a 120/240 V dwelling panel beside a
-- 208Y/120 V service) or a 120/208 V single-phase three-wire panel fed from two poles of a
-- 208Y/120 V one. NULL is the site's system, so every existing board is unchanged. The new system
-- SINGLE_PHASE_120_208 may also be a site's own (a service of two lines of a 208Y/120 V network).
-- One script for PostgreSQL and H2 (PostgreSQL mode).

ALTER TABLE board ADD COLUMN supply_system VARCHAR(24);
ALTER TABLE board ADD CONSTRAINT board_supply_system_known
    CHECK (supply_system IS NULL OR supply_system IN
        ('IEC_WYE', 'SPLIT_PHASE_120_240', 'WYE_208Y_120', 'WYE_480Y_277', 'SINGLE_PHASE_120_208'));

ALTER TABLE site DROP CONSTRAINT site_supply_system_known;
ALTER TABLE site ADD CONSTRAINT site_supply_system_known
    CHECK (supply_system IN
        ('IEC_WYE', 'SPLIT_PHASE_120_240', 'WYE_208Y_120', 'WYE_480Y_277', 'SINGLE_PHASE_120_208'));
