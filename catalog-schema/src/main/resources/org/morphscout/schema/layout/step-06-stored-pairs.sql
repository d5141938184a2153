-- Stored pairs. Each ready image "chooses" its pair candidates from the vector index (pair_choices); every chosen
-- pair's measures are kept (pair_measures), so a pair query re-ranks stored measures under any score settings
-- instead of measuring and warping again. A picture's own facts that a score needs (frame size, framing, silhouette
-- confidence) are kept once per image (pair_choosers.facts). Blobs are little-endian; their layout is the indexer's
-- (library.StoredPairCodec). Append-only: never edit a layout step that has shipped.

CREATE TABLE pair_choosers (
  image_id    INTEGER PRIMARY KEY REFERENCES images(id) ON DELETE CASCADE,
  candidates  INTEGER NOT NULL,            -- candidates asked of the vector index, per field
  facts       BLOB NOT NULL,               -- the picture's facts
  chosen_at   TEXT NOT NULL
);

CREATE TABLE pair_choices (
  chooser  INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  other    INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  PRIMARY KEY (chooser, other),
  CHECK (chooser <> other)
) WITHOUT ROWID;
CREATE INDEX pair_choices_by_other ON pair_choices(other);

-- One row per unordered pair, first_id < second_id; the first is the picture the morph starts from.
CREATE TABLE pair_measures (
  first_id   INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  second_id  INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  kind       INTEGER NOT NULL CHECK (kind IN (0, 1, 2, 3)), -- 0 measured, 1 bounded (warp not estimated: its cheap
                                                           -- measures bound the score too low), 2 near-duplicate,
                                                           -- 3 no object in one of the pictures
  version    INTEGER NOT NULL,             -- version of the measuring code
  measures   BLOB,                         -- kinds 0 and 1: float32 measures; NULL otherwise
  PRIMARY KEY (first_id, second_id),
  CHECK (first_id < second_id)
) WITHOUT ROWID;
CREATE INDEX pair_measures_by_second ON pair_measures(second_id);

-- The setting 'stored_pairs_complete' is written by the indexer when every ready image's pairs are stored and
-- measured; any change that voids stored pairs deletes it, so a reader knows in one lookup whether the store answers.

-- New features (a first or a new analysis) make the image's own pairs and choices void.
CREATE TRIGGER pairs_void_on_new_features AFTER INSERT ON features
BEGIN
  DELETE FROM settings WHERE key = 'stored_pairs_complete';
  DELETE FROM pair_measures WHERE first_id = NEW.image_id;
  DELETE FROM pair_measures WHERE second_id = NEW.image_id;
  DELETE FROM pair_choices WHERE chooser = NEW.image_id;
  DELETE FROM pair_choosers WHERE image_id = NEW.image_id;
END;

-- An image that becomes ready (new, or back) is not paired yet.
CREATE TRIGGER pairs_incomplete_on_ready AFTER UPDATE OF status ON images
WHEN NEW.status = 'ready' AND OLD.status <> 'ready'
BEGIN
  DELETE FROM settings WHERE key = 'stored_pairs_complete';
END;

-- An image that stops being ready loses its pairs; the images that had chosen it choose again.
CREATE TRIGGER pairs_void_on_leaving_ready AFTER UPDATE OF status ON images
WHEN OLD.status = 'ready' AND NEW.status <> 'ready'
BEGIN
  DELETE FROM settings WHERE key = 'stored_pairs_complete';
  DELETE FROM pair_measures WHERE first_id = NEW.id;
  DELETE FROM pair_measures WHERE second_id = NEW.id;
  DELETE FROM pair_choosers WHERE image_id IN (SELECT chooser FROM pair_choices WHERE other = NEW.id);
  DELETE FROM pair_choices WHERE other = NEW.id;
  DELETE FROM pair_choices WHERE chooser = NEW.id;
  DELETE FROM pair_choosers WHERE image_id = NEW.id;
END;
