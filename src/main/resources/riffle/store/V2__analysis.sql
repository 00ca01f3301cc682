-- Schema 2: what text analysis keeps in the project file. The masked text is what every later
-- stage, screen and export shows by default; the full parse lives in the derived folder.

ALTER TABLE answer ADD COLUMN masked TEXT;               -- NULL until analysed
ALTER TABLE answer ADD COLUMN language TEXT;             -- ISO 639-3, or 'und'
ALTER TABLE answer ADD COLUMN foreign_language INTEGER NOT NULL DEFAULT 0 CHECK (foreign_language IN (0, 1));
ALTER TABLE answer ADD COLUMN analysed_with TEXT;        -- analysis version that wrote the columns above

CREATE TABLE answer_pii (
  answer_id    INTEGER NOT NULL REFERENCES answer(id) ON DELETE CASCADE,
  type         TEXT    NOT NULL,                         -- email, phone, url, card, reference, handle, name
  start        INTEGER NOT NULL,                         -- offsets into answer.normalized
  end          INTEGER NOT NULL,
  masked_start INTEGER NOT NULL,                         -- offsets into answer.masked
  masked_end   INTEGER NOT NULL,
  PRIMARY KEY (answer_id, start)
) WITHOUT ROWID;
