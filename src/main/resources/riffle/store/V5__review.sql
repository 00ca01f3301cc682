-- Schema 5: review state. A person read this answer and no (further) code applies to it. With the
-- codes a person gave (manual, imported, accepted suggestion) and the codes a person took off
-- (assignment_veto), it tells which answers a person has read: the findings count only those.
-- Written through the edit log (undoable per coder); an import coded elsewhere writes it for the
-- answers of a coded column that carry no code.

CREATE TABLE answer_read (
  answer_id  INTEGER PRIMARY KEY REFERENCES answer(id) ON DELETE CASCADE,
  coder      TEXT    NOT NULL,
  created_at TEXT    NOT NULL
);

-- Which answers a person read is asked of every coding page (the progress) and every report.
CREATE INDEX assignment_by_origin ON assignment(origin, answer_id);
