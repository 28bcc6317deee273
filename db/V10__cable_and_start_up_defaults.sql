-- Defaults as data: a site and a board may carry the cable conditions and start-up multiples that
-- their circuits inherit unless a circuit records its own. A board's default wins over its site's.
-- All columns are optional: an empty default inherits from the site, or leaves the input missing.

ALTER TABLE site ADD COLUMN default_installation_method VARCHAR(4);
ALTER TABLE site ADD COLUMN default_ambient_celsius DOUBLE PRECISION CHECK (default_ambient_celsius BETWEEN -30 AND 90);
ALTER TABLE site ADD COLUMN default_grouped_circuits INTEGER CHECK (default_grouped_circuits BETWEEN 1 AND 100);
ALTER TABLE site ADD COLUMN default_thermal_insulation_mm INTEGER CHECK (default_thermal_insulation_mm >= 0);
ALTER TABLE site ADD COLUMN default_material VARCHAR(10) CHECK (default_material IN ('COPPER', 'ALUMINIUM'));
ALTER TABLE site ADD COLUMN default_insulation VARCHAR(20) CHECK (default_insulation IN ('THERMOPLASTIC_70', 'THERMOSETTING_90'));

ALTER TABLE board ADD COLUMN default_installation_method VARCHAR(4);
ALTER TABLE board ADD COLUMN default_ambient_celsius DOUBLE PRECISION CHECK (default_ambient_celsius BETWEEN -30 AND 90);
ALTER TABLE board ADD COLUMN default_grouped_circuits INTEGER CHECK (default_grouped_circuits BETWEEN 1 AND 100);
ALTER TABLE board ADD COLUMN default_thermal_insulation_mm INTEGER CHECK (default_thermal_insulation_mm >= 0);
ALTER TABLE board ADD COLUMN default_material VARCHAR(10) CHECK (default_material IN ('COPPER', 'ALUMINIUM'));
ALTER TABLE board ADD COLUMN default_insulation VARCHAR(20) CHECK (default_insulation IN ('THERMOPLASTIC_70', 'THERMOSETTING_90'));

-- Start-up (inrush) multiple of a load category, for loads that record none of their own.
CREATE TABLE site_start_up_multiple (
    site_id     BIGINT           NOT NULL REFERENCES site (id) ON DELETE CASCADE,
    category    VARCHAR(30)      NOT NULL,
    multiple    DOUBLE PRECISION NOT NULL CHECK (multiple >= 1 AND multiple <= 50),
    PRIMARY KEY (site_id, category)
);

CREATE TABLE board_start_up_multiple (
    board_id    BIGINT           NOT NULL REFERENCES board (id) ON DELETE CASCADE,
    category    VARCHAR(30)      NOT NULL,
    multiple    DOUBLE PRECISION NOT NULL CHECK (multiple >= 1 AND multiple <= 50),
    PRIMARY KEY (board_id, category)
);
