-- Schema version 2: what the meeting screens of several processes share besides the ledger.
-- At most one open meeting per cycle: the first to open it is its facilitator.
CREATE UNIQUE INDEX meetings_one_open_per_cycle ON meetings(cycle) WHERE ended_at IS NULL;
-- Everyone who joined a meeting; seen_at is refreshed while their screen runs, left_at set when it quits.
CREATE TABLE meeting_people(
  meeting_id INTEGER NOT NULL REFERENCES meetings(id),
  person     TEXT NOT NULL CHECK (length(person) > 0),
  joined_at  TEXT NOT NULL,
  seen_at    TEXT NOT NULL,
  left_at    TEXT,
  PRIMARY KEY (meeting_id, person)
) WITHOUT ROWID;
-- Items the facilitator put on the table, in order; the latest is the one on the table now.
CREATE TABLE meeting_tabled(
  id         INTEGER PRIMARY KEY,
  meeting_id INTEGER NOT NULL REFERENCES meetings(id),
  item_id    INTEGER NOT NULL REFERENCES items(id),
  tabled_at  TEXT NOT NULL
);
CREATE INDEX meeting_tabled_by_meeting ON meeting_tabled(meeting_id, id);
-- A form's unsaved input, kept so that a dropped connection loses nothing.
CREATE TABLE form_drafts(
  meeting_id INTEGER NOT NULL REFERENCES meetings(id),
  person     TEXT NOT NULL,
  item_id    INTEGER NOT NULL REFERENCES items(id),
  fields     TEXT NOT NULL,
  saved_at   TEXT NOT NULL,
  PRIMARY KEY (meeting_id, person, item_id)
) WITHOUT ROWID;
