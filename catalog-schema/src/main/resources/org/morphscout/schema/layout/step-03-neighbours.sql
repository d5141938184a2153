-- The neighbour graph: each ready image linked to its nearest neighbours, with the step's components kept so a query
-- can re-weight shape against appearance without a rebuild. Stored one way; readers treat it as undirected.

CREATE TABLE neighbours (
  image_id      INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  neighbour_id  INTEGER NOT NULL REFERENCES images(id) ON DELETE CASCADE,
  appearance    REAL NOT NULL,             -- 1 - cosine of appearance vectors, in [0, 2]
  shape         REAL NOT NULL,             -- 1 - cosine of shape vectors, in [0, 2]
  colour        REAL NOT NULL,             -- CIEDE2000 between foreground means
  PRIMARY KEY (image_id, neighbour_id)
);
CREATE INDEX neighbours_by_neighbour ON neighbours(neighbour_id);
