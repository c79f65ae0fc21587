-- Studies, the files imported into them, and their runs.
-- Times are ISO 8601 UTC text; JSON columns hold text exactly as it was received or produced.

CREATE TABLE studies (
  id          TEXT PRIMARY KEY,
  name        TEXT NOT NULL,
  -- The study document as the user sent it (validated before it was written).
  document    TEXT NOT NULL,
  created_at  TEXT NOT NULL,
  updated_at  TEXT NOT NULL
);

CREATE TABLE study_files (
  id           INTEGER PRIMARY KEY,
  study_id     TEXT NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
  kind         TEXT NOT NULL CHECK (kind IN ('communities-csv', 'sources-geojson')),
  content      TEXT NOT NULL,
  imported_at  TEXT NOT NULL
);
CREATE INDEX study_files_by_study ON study_files(study_id, kind, id);

CREATE TABLE runs (
  id               TEXT PRIMARY KEY,
  study_id         TEXT NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
  status           TEXT NOT NULL CHECK (status IN ('queued', 'running', 'done', 'failed', 'cancelled', 'interrupted')),
  -- Share of the work done, 0 to 1.
  progress         REAL NOT NULL DEFAULT 0 CHECK (progress >= 0 AND progress <= 1),
  -- The inputs the run computed, kept with it: the study may be edited afterwards.
  document         TEXT NOT NULL,
  communities_csv  TEXT,
  input_hash       TEXT NOT NULL,
  provenance       TEXT,
  results          TEXT,
  error            TEXT,
  created_at       TEXT NOT NULL,
  started_at       TEXT,
  finished_at      TEXT,
  -- Results exist only on a finished, successful run (written in the statement that finishes it).
  CHECK ((results IS NULL) OR (status = 'done'))
);
CREATE INDEX runs_by_study ON runs(study_id, created_at);
CREATE INDEX runs_by_status ON runs(status);

-- A finished run is a record of what was computed: nothing may change it afterwards.
CREATE TRIGGER runs_finished_are_immutable
BEFORE UPDATE ON runs
WHEN OLD.status IN ('done', 'failed', 'cancelled', 'interrupted')
BEGIN
  SELECT RAISE(ABORT, 'a finished run cannot be changed');
END;
