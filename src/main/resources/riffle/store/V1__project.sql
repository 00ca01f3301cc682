-- Schema 1 of the Riffle project file. Every migration is a forward step; never edit a released one.

CREATE TABLE wave (
  id          INTEGER PRIMARY KEY,
  name        TEXT    NOT NULL UNIQUE COLLATE NOCASE CHECK (length(trim(name)) > 0),
  fielded_on  TEXT    NOT NULL,                -- ISO date the wave was fielded
  position    INTEGER NOT NULL,                -- order of creation
  created_at  TEXT    NOT NULL
);

CREATE TABLE import_batch (
  id          INTEGER PRIMARY KEY,
  wave_id     INTEGER NOT NULL REFERENCES wave(id),
  source      TEXT    NOT NULL,                -- file name, or "paste"
  sha256      TEXT    NOT NULL,
  encoding    TEXT    NOT NULL,
  delimiter   TEXT    NOT NULL,
  rows        INTEGER NOT NULL,
  answers     INTEGER NOT NULL,
  duplicates  INTEGER NOT NULL,
  skipped     INTEGER NOT NULL,
  imported_at TEXT    NOT NULL,
  imported_by TEXT    NOT NULL
);

CREATE TABLE question (
  id          INTEGER PRIMARY KEY,
  text        TEXT    NOT NULL UNIQUE,
  position    INTEGER NOT NULL
);

CREATE TABLE respondent (
  id           INTEGER PRIMARY KEY,
  wave_id      INTEGER NOT NULL REFERENCES wave(id) ON DELETE CASCADE,
  external_id  TEXT    NOT NULL,               -- the export's id, or "row-N"
  responded_at TEXT,
  batch_id     INTEGER NOT NULL REFERENCES import_batch(id),
  source_line  INTEGER NOT NULL,
  UNIQUE (wave_id, external_id)
);

CREATE TABLE respondent_meta (
  respondent_id INTEGER NOT NULL REFERENCES respondent(id) ON DELETE CASCADE,
  key           TEXT    NOT NULL,
  value         TEXT    NOT NULL,
  PRIMARY KEY (respondent_id, key)
) WITHOUT ROWID;

CREATE TABLE answer (
  id            INTEGER PRIMARY KEY,
  respondent_id INTEGER NOT NULL REFERENCES respondent(id) ON DELETE CASCADE,
  question_id   INTEGER NOT NULL REFERENCES question(id),
  original      TEXT    NOT NULL,              -- verbatim as in the export
  normalized    TEXT    NOT NULL,              -- Unicode NFC, for analysis
  substantive   INTEGER NOT NULL CHECK (substantive IN (0, 1)),
  source_line   INTEGER NOT NULL,
  source_column INTEGER NOT NULL,
  UNIQUE (respondent_id, question_id)
);
CREATE INDEX answer_by_question ON answer(question_id);

CREATE TABLE code (
  id               INTEGER PRIMARY KEY,
  name             TEXT    NOT NULL UNIQUE COLLATE NOCASE CHECK (length(trim(name)) > 0),
  description      TEXT    NOT NULL DEFAULT '',
  include_guidance TEXT    NOT NULL DEFAULT '',
  exclude_guidance TEXT    NOT NULL DEFAULT '',
  colour           TEXT,
  shortcut         TEXT    UNIQUE,
  parent_id        INTEGER REFERENCES code(id),
  direction        TEXT    NOT NULL DEFAULT 'neutral' CHECK (direction IN ('praise', 'friction', 'neutral')),
  archived         INTEGER NOT NULL DEFAULT 0 CHECK (archived IN (0, 1)),
  position         INTEGER NOT NULL,
  origin           TEXT    NOT NULL DEFAULT 'manual' CHECK (origin IN ('manual', 'imported')),
  created_at       TEXT    NOT NULL
);

CREATE TABLE code_example (
  code_id   INTEGER NOT NULL REFERENCES code(id) ON DELETE CASCADE,
  answer_id INTEGER NOT NULL REFERENCES answer(id) ON DELETE CASCADE,
  PRIMARY KEY (code_id, answer_id)
) WITHOUT ROWID;

CREATE TABLE assignment (
  id         INTEGER PRIMARY KEY,
  answer_id  INTEGER NOT NULL REFERENCES answer(id) ON DELETE CASCADE,
  code_id    INTEGER NOT NULL REFERENCES code(id),
  span_start INTEGER,                          -- character offsets into the original text
  span_end   INTEGER,
  coder      TEXT    NOT NULL,
  origin     TEXT    NOT NULL CHECK (origin IN ('manual', 'rule', 'imported', 'suggestion')),
  created_at TEXT    NOT NULL,
  CHECK ((span_start IS NULL) = (span_end IS NULL)),
  CHECK (span_start IS NULL OR (0 <= span_start AND span_start < span_end)),
  UNIQUE (answer_id, code_id)
);
CREATE INDEX assignment_by_code ON assignment(code_id);

CREATE TABLE audit (
  id     INTEGER PRIMARY KEY,
  at     TEXT NOT NULL,
  actor  TEXT NOT NULL,
  action TEXT NOT NULL,
  detail TEXT NOT NULL                         -- JSON object
);
