-- The earthquake catalog attached to a study: at most one per study, kept as it was received.
-- Counts are those of the load when it was attached (the text parses the same way every time).

CREATE TABLE study_catalogs (
  study_id          TEXT PRIMARY KEY REFERENCES studies(id) ON DELETE CASCADE,
  file_name         TEXT NOT NULL CHECK (length(file_name) BETWEEN 1 AND 200),
  format            TEXT NOT NULL CHECK (format IN ('csv', 'fdsn-text', 'quakeml')),
  -- The catalog text exactly as it was sent.
  content           TEXT NOT NULL,
  imported_at       TEXT NOT NULL,
  loaded_count      INTEGER NOT NULL CHECK (loaded_count > 0),
  rejected_count    INTEGER NOT NULL CHECK (rejected_count >= 0),
  -- Loaded events whose magnitude is not a moment magnitude.
  non_moment_count  INTEGER NOT NULL CHECK (non_moment_count >= 0 AND non_moment_count <= loaded_count)
);
