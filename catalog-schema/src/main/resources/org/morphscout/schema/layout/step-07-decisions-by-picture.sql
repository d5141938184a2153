-- Decisions follow the pictures judged, not their paths or row ids: each side is named by the picture's content hash
-- (hex SHA-256), or 'id:<n>' for an image never hashed (and for both sides when they are byte-identical). A different
-- picture later found at an old path therefore starts with no decisions. The paths at decision time are kept to show
-- a decision whose pictures are no longer in the catalog.
-- Append-only: never edit a layout step that has shipped.

CREATE TABLE decisions_by_picture (
  picture_a   TEXT NOT NULL,
  picture_b   TEXT NOT NULL,
  path_a      TEXT NOT NULL,
  path_b      TEXT NOT NULL,
  verdict     TEXT NOT NULL CHECK (verdict IN ('approved', 'rejected')),
  note        TEXT,
  decided_at  TEXT NOT NULL,
  PRIMARY KEY (picture_a, picture_b),
  CHECK (picture_a < picture_b)
);

-- Oldest first, so that when two old decisions name the same two pictures the newest one stays.
INSERT OR REPLACE INTO decisions_by_picture(picture_a, picture_b, path_a, path_b, verdict, note, decided_at)
SELECT CASE WHEN ka < kb THEN ka ELSE kb END, CASE WHEN ka < kb THEN kb ELSE ka END,
       CASE WHEN ka < kb THEN pa ELSE pb END, CASE WHEN ka < kb THEN pb ELSE pa END, verdict, note, decided_at
FROM (SELECT CASE WHEN a.content_hash IS NULL OR a.content_hash = b.content_hash
                  THEN 'id:' || d.image_a ELSE a.content_hash END AS ka,
             CASE WHEN b.content_hash IS NULL OR a.content_hash = b.content_hash
                  THEN 'id:' || d.image_b ELSE b.content_hash END AS kb,
             a.path AS pa, b.path AS pb, d.verdict, d.note, d.decided_at
      FROM decisions d JOIN images a ON a.id = d.image_a JOIN images b ON b.id = d.image_b
      ORDER BY d.decided_at, d.image_a, d.image_b);

DROP TABLE decisions;
ALTER TABLE decisions_by_picture RENAME TO decisions;
CREATE INDEX decisions_by_b ON decisions(picture_b);
