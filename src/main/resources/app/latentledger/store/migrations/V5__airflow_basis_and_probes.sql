-- Version 5: what an airflow number means and how the two humidity probes relate.
-- airflow_basis: 'actual' (volume at the air's own state) or 'standard' (cfm at 0.075 lb/ft³);
-- every reading set stored before this step was worked out as actual, so that is the default.
-- same_probe: 1 when one instrument read return and supply, or two probes were compared side by
-- side and corrected to each other (their offsets are then correlated in the uncertainty budget).
-- supply_dew_point_offset_k: the supply probe's dew point minus the return probe's in the same
-- air, K, taken off the supply reading; 0 when none was found.

ALTER TABLE reading_set ADD COLUMN airflow_basis TEXT NOT NULL DEFAULT 'actual'
    CHECK (airflow_basis IN ('actual', 'standard'));
ALTER TABLE reading_set ADD COLUMN same_probe INTEGER NOT NULL DEFAULT 0 CHECK (same_probe IN (0, 1));
ALTER TABLE reading_set ADD COLUMN supply_dew_point_offset_k REAL NOT NULL DEFAULT 0
    CHECK (supply_dew_point_offset_k BETWEEN -5 AND 5);
