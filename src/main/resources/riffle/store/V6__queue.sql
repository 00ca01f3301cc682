-- Schema 6: random review queues. A queue puts the substantive answers of one wave and question
-- (or of one segment value of them) in a seeded random order, so that the answers read from its
-- start are a simple random sample. Only the seed is stored: the order sorts the answers by a mix
-- of the seed and each answer's id (riffle.coding.ReviewOrder), so answers added to the wave later
-- fall into random places. Schema 5 belongs to the review state (read answers).

CREATE TABLE review_queue (
  id            INTEGER PRIMARY KEY,
  wave_id       INTEGER NOT NULL REFERENCES wave(id) ON DELETE CASCADE,
  question_id   INTEGER NOT NULL REFERENCES question(id),
  segment_key   TEXT    NOT NULL DEFAULT '' COLLATE NOCASE,   -- '' for the whole wave
  segment_value TEXT    NOT NULL DEFAULT '' COLLATE NOCASE,
  seed          INTEGER NOT NULL CHECK (seed BETWEEN 0 AND 9007199254740991),
  started_by    TEXT    NOT NULL,
  started_at    TEXT    NOT NULL,
  CHECK ((segment_key = '') = (segment_value = '')),
  UNIQUE (wave_id, question_id, segment_key, segment_value)
);
