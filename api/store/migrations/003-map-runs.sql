-- Hazard-map runs of saved studies: the request, the life of the run, and the GeoJSON it made.
-- Times are ISO 8601 UTC text; JSON columns hold text exactly as it was produced.

CREATE TABLE map_runs (
  id                   TEXT PRIMARY KEY,
  study_id             TEXT NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
  status               TEXT NOT NULL CHECK (status IN ('queued', 'running', 'done', 'failed', 'cancelled', 'interrupted')),
  -- Share of the grid points done, 0 to 1.
  progress             REAL NOT NULL DEFAULT 0 CHECK (progress >= 0 AND progress <= 1),
  -- The request: a measure ("PGA", "PGV", "SA(T)"), then either a return period (years) or a
  -- level of the measure (g; PGV cm/s) with a horizon (years); the grid spacing (km), the one
  -- Vs30 (m/s) given to every point, and the box mapped ([west, south, east, north] in degrees
  -- as JSON; NULL for the study area).
  measure              TEXT NOT NULL CHECK (length(measure) BETWEEN 1 AND 40),
  return_period_years  REAL CHECK (return_period_years > 0),
  level                REAL CHECK (level > 0),
  horizon_years        REAL CHECK (horizon_years > 0),
  spacing_km           REAL NOT NULL CHECK (spacing_km > 0),
  vs30                 REAL NOT NULL CHECK (vs30 > 0),
  bounds               TEXT,
  -- input-hash.ts inputHash of the validated study the map was computed from.
  input_hash           TEXT NOT NULL,
  -- What the map is of and its grid (map-geojson.ts MapDescription), once the grid is known.
  description          TEXT,
  -- JSON array of the map's warnings, and its provenance, once it is done.
  warnings             TEXT,
  provenance           TEXT,
  geojson              TEXT,
  error                TEXT,
  created_at           TEXT NOT NULL,
  started_at           TEXT,
  finished_at          TEXT,
  -- One quantity: a return period, or a level with a horizon.
  CHECK ((return_period_years IS NULL) <> (level IS NULL)),
  CHECK ((level IS NULL) = (horizon_years IS NULL)),
  -- A done map has its GeoJSON and nothing else has any (written in the statement that finishes it).
  CHECK ((geojson IS NOT NULL) = (status = 'done'))
);
CREATE INDEX map_runs_by_study ON map_runs(study_id, created_at);
CREATE INDEX map_runs_by_status ON map_runs(status);

-- A finished map run is a record of what was computed: nothing may change it afterwards.
CREATE TRIGGER map_runs_finished_are_immutable
BEFORE UPDATE ON map_runs
WHEN OLD.status IN ('done', 'failed', 'cancelled', 'interrupted')
BEGIN
  SELECT RAISE(ABORT, 'a finished map run cannot be changed');
END;
