-- Schema 7: a question's short name. Exports with two header rows put a short name (Q2) above each
-- question's wording; the wording stays the question's text, the name is kept beside it. Null for
-- questions imported with one header row. A later import with a name fills it in once.
ALTER TABLE question ADD COLUMN name TEXT;
