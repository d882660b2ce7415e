-- A meeting screen reads its meeting's decisions on every change anyone commits: without this
-- index each read scans the whole ledger, every cycle's decisions.
CREATE INDEX decisions_by_meeting ON decisions(meeting_id) WHERE meeting_id IS NOT NULL;

-- The agenda a meeting was ranked with, kept with the meeting: every screen of the meeting
-- shows the same order with the same numbers for its whole length, and a screen that joins or
-- comes back reads it instead of ranking the cycle again. The rows are one value in a format of
-- our own (store/MeetingAgendas: format 1), because the agenda is only ever read whole and a
-- 50,000-row agenda read column by column through the driver takes most of a second. (`plenum
-- agenda` ranks the cycle as the data stand now.)
CREATE TABLE meeting_agendas(
  meeting_id INTEGER PRIMARY KEY REFERENCES meetings(id),
  ranking    INTEGER NOT NULL CHECK (ranking >= 1),   -- 1, then one more each time it is ranked again
  ranked_at  TEXT NOT NULL,
  lags       TEXT NOT NULL,                       -- decision lags, comma-separated
  by_value   INTEGER NOT NULL CHECK (by_value IN (0, 1)),
  stat_step  TEXT NOT NULL,
  row_count  INTEGER NOT NULL CHECK (row_count >= 0),
  format     INTEGER NOT NULL,
  rows       BLOB NOT NULL
);
