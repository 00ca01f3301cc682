-- Schema 3: coding. Saved rules, manual removals that rules must respect, and the edit log that
-- undo and redo work from. Assignment spans point into answer.masked (what every screen shows).

CREATE TABLE code_rule (
  id         INTEGER PRIMARY KEY,
  code_id    INTEGER NOT NULL REFERENCES code(id) ON DELETE CASCADE,
  query      TEXT    NOT NULL CHECK (length(trim(query)) > 0),
  author     TEXT    NOT NULL,
  created_at TEXT    NOT NULL,
  UNIQUE (code_id, query)
);

-- A person removed this code from this answer: no rule gives it back.
CREATE TABLE assignment_veto (
  answer_id  INTEGER NOT NULL REFERENCES answer(id) ON DELETE CASCADE,
  code_id    INTEGER NOT NULL REFERENCES code(id) ON DELETE CASCADE,
  coder      TEXT    NOT NULL,
  created_at TEXT    NOT NULL,
  PRIMARY KEY (answer_id, code_id)
) WITHOUT ROWID;

-- One row per change a person (or a rule run) made; undo and redo are edits too.
CREATE TABLE edit (
  id        INTEGER PRIMARY KEY,
  coder     TEXT    NOT NULL,
  action    TEXT    NOT NULL,              -- assign, unassign, merge, undo …
  summary   TEXT    NOT NULL,              -- one sentence for the person who made it
  at        TEXT    NOT NULL,
  state     TEXT    NOT NULL DEFAULT 'done' CHECK (state IN ('done', 'undone')),
  reverts   INTEGER REFERENCES edit(id),     -- set on an undo: the edit it took back
  restores  INTEGER REFERENCES edit(id)      -- set on a redo: the edit it made again
);
CREATE INDEX edit_by_coder ON edit(coder, id);

-- The rows an edit changed, as images before and after (JSON objects; NULL = no row).
CREATE TABLE edit_step (
  edit_id  INTEGER NOT NULL REFERENCES edit(id) ON DELETE CASCADE,
  seq      INTEGER NOT NULL,
  tbl      TEXT    NOT NULL,                -- assignment, assignment_veto, code, code_rule, code_example
  row_key  TEXT    NOT NULL,                -- JSON object of the key columns
  before   TEXT,
  after    TEXT,
  answer_id INTEGER,                        -- the answer whose coding changed, for the search index
  PRIMARY KEY (edit_id, seq)
) WITHOUT ROWID;
