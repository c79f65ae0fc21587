-- Browsers given access to the pages of a service with TREMORA_TOKEN (api/service/page-access.ts):
-- one row per access given, deleted when that browser leaves. The cookie names the row, so an
-- access ended here stays ended, also after a restart. Times are ISO 8601 UTC text.

CREATE TABLE page_access (
  id          TEXT PRIMARY KEY,
  created_at  TEXT NOT NULL,
  expires_at  TEXT NOT NULL
);
CREATE INDEX page_access_by_expiry ON page_access(expires_at);
