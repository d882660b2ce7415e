-- A meeting screen reads its meeting's decisions on every change anyone commits: without this
-- index each read scans the whole ledger, every cycle's decisions.
CREATE INDEX decisions_by_meeting ON decisions(meeting_id) WHERE meeting_id IS NOT NULL;
