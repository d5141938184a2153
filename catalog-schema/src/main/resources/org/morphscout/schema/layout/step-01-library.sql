-- Library roots, images, per-file failures and the user's decisions on pairs.
-- Append-only: never edit a migration that has shipped; add a new numbered file instead.

CREATE TABLE roots (
  id        INTEGER PRIMARY KEY,
  path      TEXT NOT NULL UNIQUE,          -- absolute, normalised
  added_at  TEXT NOT NULL                  -- ISO-8601 UTC
);

CREATE TABLE images (
  id            INTEGER PRIMARY KEY,
  root_id       INTEGER NOT NULL REFERENCES roots(id),
  path          TEXT NOT NULL UNIQUE,      -- absolute, normalised
  size          INTEGER NOT NULL,          -- bytes
  mtime_ms      INTEGER NOT NULL,          -- file modification time, ms since the epoch
  content_hash  TEXT,                      -- hex SHA-256 of the bytes; NULL until read
  width         INTEGER,                   -- pixels after EXIF orientation
  height        INTEGER,
  orientation   INTEGER,                   -- EXIF orientation tag applied, 1..8
  format        TEXT,                      -- jpeg, png, tiff, bmp, gif, webp
  status        TEXT NOT NULL CHECK (status IN ('pending', 'ready', 'failed', 'missing')),
  first_seen    TEXT NOT NULL,
  updated_at    TEXT NOT NULL
);
CREATE INDEX images_by_hash ON images(content_hash);
CREATE INDEX images_by_status ON images(status);
CREATE INDEX images_by_root ON images(root_id);

CREATE TABLE failures (
  image_id   INTEGER PRIMARY KEY REFERENCES images(id) ON DELETE CASCADE,
  reason     TEXT NOT NULL,                -- plain-language cause, without the path
  failed_at  TEXT NOT NULL
);

-- A decision is about an unordered pair: image_a < image_b always.
CREATE TABLE decisions (
  image_a     INTEGER NOT NULL REFERENCES images(id),
  image_b     INTEGER NOT NULL REFERENCES images(id),
  verdict     TEXT NOT NULL CHECK (verdict IN ('approved', 'rejected')),
  note        TEXT,
  decided_at  TEXT NOT NULL,
  PRIMARY KEY (image_a, image_b),
  CHECK (image_a < image_b)
);
CREATE INDEX decisions_by_b ON decisions(image_b);
