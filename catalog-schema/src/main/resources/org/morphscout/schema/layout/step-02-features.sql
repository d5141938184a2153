-- Per-image features: appearance vector, silhouette and shape descriptors, colour statistics.
-- Vectors are little-endian float32 blobs; the Lucene index can always be rebuilt from them.

CREATE TABLE feature_models (
  id          TEXT PRIMARY KEY,            -- e.g. gist-lab-v1, custom:<sha256 prefix>:<w>x<h>
  dimension   INTEGER NOT NULL,
  description TEXT NOT NULL,
  created_at  TEXT NOT NULL
);

CREATE TABLE features (
  image_id           INTEGER PRIMARY KEY REFERENCES images(id) ON DELETE CASCADE,
  model_id           TEXT NOT NULL REFERENCES feature_models(id),
  appearance         BLOB NOT NULL,
  shape              BLOB NOT NULL,
  silhouette_source  TEXT NOT NULL,        -- alpha, border-model, learned
  mask_width         INTEGER NOT NULL,
  mask_height        INTEGER NOT NULL,
  mask               BLOB NOT NULL,        -- row-major bits, packed 8 a byte, most significant first
  components         INTEGER NOT NULL,
  touches_frame      INTEGER NOT NULL CHECK (touches_frame IN (0, 1)),
  coverage           REAL NOT NULL,
  confidence         REAL NOT NULL,
  descriptors        TEXT NOT NULL,        -- JSON: Hu moments, bounding box, aspect, centroid, orientation
  colour             TEXT NOT NULL,        -- JSON: CIELAB means and deviations, dominant colours
  computed_at        TEXT NOT NULL
);
CREATE INDEX features_by_model ON features(model_id);

-- Catalog-wide settings (for example the active appearance model).
CREATE TABLE settings (
  key    TEXT PRIMARY KEY,
  value  TEXT NOT NULL
);
