-- Schema version 1: the workspace. Periods and cycles are stored as Period.index integers and
-- quantities as millionths of a unit, so that comparisons and differences are exact.
CREATE TABLE meta(
  key   TEXT PRIMARY KEY,
  value TEXT NOT NULL
);
CREATE TABLE steps(
  id       INTEGER PRIMARY KEY,
  name     TEXT NOT NULL UNIQUE,
  position INTEGER NOT NULL UNIQUE
);
CREATE TABLE items(
  id          INTEGER PRIMARY KEY,
  item        TEXT NOT NULL UNIQUE,
  description TEXT NOT NULL,
  item_group  TEXT,
  region      TEXT,
  unit_value  INTEGER CHECK (unit_value >= 0)
);
CREATE TABLE item_attributes(
  item_id INTEGER NOT NULL REFERENCES items(id),
  name    TEXT NOT NULL,
  value   TEXT NOT NULL,
  PRIMARY KEY (item_id, name)
) WITHOUT ROWID;
CREATE TABLE actuals(
  item_id  INTEGER NOT NULL REFERENCES items(id),
  period   INTEGER NOT NULL,
  quantity INTEGER NOT NULL CHECK (quantity >= 0),
  PRIMARY KEY (item_id, period)
) WITHOUT ROWID;
CREATE TABLE forecasts(
  item_id  INTEGER NOT NULL REFERENCES items(id),
  step_id  INTEGER NOT NULL REFERENCES steps(id),
  cycle    INTEGER NOT NULL,
  period   INTEGER NOT NULL CHECK (period >= cycle),
  quantity INTEGER NOT NULL CHECK (quantity >= 0),
  -- step first: scoring reads one step at a time, in item order
  PRIMARY KEY (step_id, item_id, cycle, period)
) WITHOUT ROWID;
CREATE TABLE tags(
  name    TEXT PRIMARY KEY,
  builtin INTEGER NOT NULL CHECK (builtin IN (0, 1))
);
CREATE TABLE events(
  item_id INTEGER NOT NULL REFERENCES items(id),
  period  INTEGER NOT NULL,
  tag     TEXT NOT NULL REFERENCES tags(name),
  note    TEXT NOT NULL DEFAULT '',
  PRIMARY KEY (item_id, period, tag)
) WITHOUT ROWID;
CREATE TABLE meetings(
  id             INTEGER PRIMARY KEY,
  cycle          INTEGER NOT NULL,
  facilitator    TEXT NOT NULL,
  budget_minutes INTEGER,
  started_at     TEXT NOT NULL,
  ended_at       TEXT,
  total_minutes  INTEGER
);
-- The decision ledger. One row per (item, cycle, period, step) decision; rows saved together
-- share a batch. Never updated or deleted: a correction is a new row naming the row it supersedes.
CREATE TABLE decisions(
  id          INTEGER PRIMARY KEY,
  batch       INTEGER NOT NULL,
  item_id     INTEGER NOT NULL REFERENCES items(id),
  cycle       INTEGER NOT NULL,
  period      INTEGER NOT NULL CHECK (period >= cycle),
  step_id     INTEGER NOT NULL REFERENCES steps(id),
  prior       INTEGER NOT NULL CHECK (prior >= 0),
  quantity    INTEGER NOT NULL CHECK (quantity >= 0),
  kept        INTEGER NOT NULL CHECK (kept IN (0, 1) AND (kept = 0 OR quantity = prior)),
  reason      TEXT NOT NULL CHECK (length(trim(reason)) > 0),
  tag         TEXT NOT NULL REFERENCES tags(name),
  author      TEXT NOT NULL CHECK (length(author) > 0),
  minutes     INTEGER CHECK (minutes >= 0),
  recorded_at TEXT NOT NULL,
  supersedes  INTEGER UNIQUE REFERENCES decisions(id),
  meeting_id  INTEGER REFERENCES meetings(id)
);
CREATE INDEX decisions_by_key ON decisions(item_id, cycle, period, step_id);
CREATE TRIGGER decisions_refuse_update BEFORE UPDATE ON decisions
BEGIN
  SELECT RAISE(ABORT, 'the decision ledger is append-only: record a new decision that supersedes this one');
END;
CREATE TRIGGER decisions_refuse_delete BEFORE DELETE ON decisions
BEGIN
  SELECT RAISE(ABORT, 'the decision ledger is append-only: decisions are never deleted');
END;
INSERT INTO tags(name, builtin) VALUES
  ('promotion', 1), ('price change', 1), ('new listing', 1), ('delisting', 1), ('holiday', 1),
  ('weather', 1), ('supply limit', 1), ('customer information', 1), ('competitor', 1), ('other', 1);
