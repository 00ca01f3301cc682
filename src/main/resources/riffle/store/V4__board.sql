-- Schema 4: the copy board. Quotes pinned into slots, in the copywriter's order; the quote is
-- verbatim from the masked answer and stays linked to it; the working line is the copywriter's.

CREATE TABLE board_item (
  id           INTEGER PRIMARY KEY,
  slot         TEXT    NOT NULL CHECK (slot IN ('headline', 'subheadline', 'benefit', 'objection', 'proof')),
  position     INTEGER NOT NULL,
  answer_id    INTEGER NOT NULL REFERENCES answer(id) ON DELETE CASCADE,
  code         TEXT    NOT NULL,                 -- the code it was found under, as then named
  text         TEXT    NOT NULL,
  working_line TEXT,
  UNIQUE (slot, answer_id, text)
);
