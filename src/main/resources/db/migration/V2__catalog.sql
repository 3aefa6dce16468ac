-- The module catalog. A module is entered either by its maximum ratings or by its construction;
-- the lumped parameters and the listing ratings derived from either are stored beside the inputs
-- so that search, sort and the solver snapshot need no physics per row.
-- Ids come from sequences (not identity columns) so that a large CSV import can insert in JDBC batches.
CREATE SEQUENCE catalog_module_seq START WITH 1 INCREMENT BY 50;

CREATE TABLE catalog_module (
    id                          BIGINT           NOT NULL PRIMARY KEY,
    supplier                    VARCHAR(120)     NOT NULL,
    part_number                 VARCHAR(80)      NOT NULL,
    description                 VARCHAR(500),
    entry_route                 VARCHAR(16)      NOT NULL,
    -- ratings route: as stated by the supplier (temperatures in degrees C at this edge)
    imax_a                      DOUBLE PRECISION,
    vmax_v                      DOUBLE PRECISION,
    qmax_w                      DOUBLE PRECISION,
    dtmax_k                     DOUBLE PRECISION,
    hot_side_c                  DOUBLE PRECISION,
    ratings_method              VARCHAR(20),
    test_atmosphere             VARCHAR(16),
    -- construction route
    couples                     INTEGER,
    leg_area_mm2                DOUBLE PRECISION,
    leg_area_n_mm2              DOUBLE PRECISION,
    leg_length_mm               DOUBLE PRECISION,
    seebeck_p_v_per_k           DOUBLE PRECISION,
    seebeck_n_v_per_k           DOUBLE PRECISION,
    resistivity_p_ohm_m         DOUBLE PRECISION,
    resistivity_n_ohm_m         DOUBLE PRECISION,
    conductivity_p_w_per_mk     DOUBLE PRECISION,
    conductivity_n_w_per_mk     DOUBLE PRECISION,
    contact_resistivity_ohm_m2  DOUBLE PRECISION,
    -- derived on every write
    seebeck_v_per_k             DOUBLE PRECISION NOT NULL,
    resistance_ohm              DOUBLE PRECISION NOT NULL,
    conductance_w_per_k         DOUBLE PRECISION NOT NULL,
    figure_of_merit_per_k       DOUBLE PRECISION NOT NULL,
    list_imax_a                 DOUBLE PRECISION NOT NULL,
    list_vmax_v                 DOUBLE PRECISION NOT NULL,
    list_qmax_w                 DOUBLE PRECISION NOT NULL,
    list_dtmax_k                DOUBLE PRECISION NOT NULL,
    list_hot_side_c             DOUBLE PRECISION NOT NULL,
    -- mechanics, limits, purchasing
    width_mm                    DOUBLE PRECISION,
    length_mm                   DOUBLE PRECISION,
    height_mm                   DOUBLE PRECISION,
    max_operating_c             DOUBLE PRECISION,
    currency                    VARCHAR(3),
    lead_time_days              INTEGER,
    min_order_quantity          INTEGER,
    lifecycle                   VARCHAR(24)      NOT NULL,
    rohs                        BOOLEAN,
    reach                       BOOLEAN,
    datasheet_ref               VARCHAR(200),
    notes                       VARCHAR(2000),
    archived                    BOOLEAN          NOT NULL,
    version                     BIGINT           NOT NULL,
    created_at                  TIMESTAMP WITH TIME ZONE NOT NULL,
    created_by                  VARCHAR(64)      NOT NULL,
    updated_at                  TIMESTAMP WITH TIME ZONE NOT NULL,
    updated_by                  VARCHAR(64)      NOT NULL,
    CONSTRAINT uk_catalog_module_part UNIQUE (supplier, part_number)
);

CREATE INDEX ix_catalog_module_listing ON catalog_module (archived, supplier, part_number);

CREATE TABLE catalog_price_break (
    module_id   BIGINT        NOT NULL REFERENCES catalog_module (id),
    quantity    INTEGER       NOT NULL,
    unit_price  NUMERIC(14, 4) NOT NULL,
    PRIMARY KEY (module_id, quantity)
);

-- One row: a counter bumped by every committed catalog change, so each app instance can tell
-- whether its in-memory solver snapshot is current, and whether the demo catalog was loaded.
CREATE TABLE catalog_state (
    id           INTEGER NOT NULL PRIMARY KEY,
    revision     BIGINT  NOT NULL,
    demo_loaded  BOOLEAN NOT NULL
);
INSERT INTO catalog_state (id, revision, demo_loaded) VALUES (1, 0, FALSE);
