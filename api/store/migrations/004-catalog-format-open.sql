-- The catalog's format is checked where catalogs are read (api/catalog/catalog-formats.ts), so
-- a new format needs no table rebuild: the table is rebuilt once more, without the list of names.

CREATE TABLE study_catalogs_new (
  study_id          TEXT PRIMARY KEY REFERENCES studies(id) ON DELETE CASCADE,
  file_name         TEXT NOT NULL CHECK (length(file_name) BETWEEN 1 AND 200),
  format            TEXT NOT NULL CHECK (length(format) BETWEEN 1 AND 40),
  -- The catalog text exactly as it was sent.
  content           TEXT NOT NULL,
  imported_at       TEXT NOT NULL,
  loaded_count      INTEGER NOT NULL CHECK (loaded_count > 0),
  rejected_count    INTEGER NOT NULL CHECK (rejected_count >= 0),
  -- Loaded events whose magnitude is not a moment magnitude.
  non_moment_count  INTEGER NOT NULL CHECK (non_moment_count >= 0 AND non_moment_count <= loaded_count)
);

INSERT INTO study_catalogs_new SELECT study_id, file_name, format, content, imported_at, loaded_count, rejected_count, non_moment_count FROM study_catalogs;
DROP TABLE study_catalogs;
ALTER TABLE study_catalogs_new RENAME TO study_catalogs;
