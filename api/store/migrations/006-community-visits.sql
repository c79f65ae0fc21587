-- Awareness visits to a study's communities: what was done, for whom, and the referral it led to.
-- Deleting the study deletes its visits (ON DELETE CASCADE); the pages ask first, with the count.

CREATE TABLE community_visits (
  id              TEXT PRIMARY KEY,
  study_id        TEXT NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
  -- The community's id in the study document (communities live in the document, not a table).
  community_id    TEXT NOT NULL CHECK (length(community_id) BETWEEN 1 AND 200),
  -- The day of the visit, YYYY-MM-DD.
  visited_on      TEXT NOT NULL CHECK (visited_on GLOB '[0-9][0-9][0-9][0-9]-[0-9][0-9]-[0-9][0-9]'),
  language        TEXT NOT NULL CHECK (length(language) BETWEEN 1 AND 80),
  people_reached  INTEGER NOT NULL CHECK (people_reached >= 0),
  topics          TEXT NOT NULL CHECK (length(topics) <= 2000),
  follow_ups      TEXT NOT NULL CHECK (length(follow_ups) <= 2000),
  referral        TEXT NOT NULL CHECK (referral IN ('none', 'requested', 'assessed', 'closed')),
  recorded_at     TEXT NOT NULL
);
CREATE INDEX community_visits_by_community ON community_visits(study_id, community_id, visited_on);
