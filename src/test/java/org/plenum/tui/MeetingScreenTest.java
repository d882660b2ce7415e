package org.plenum.tui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Decision;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.store.Ledger;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;
import org.plenum.testing.TestWorkspace;

/** Every view and key of UX.md through Lanterna's virtual terminal: keys typed, screen text and ledger read back. */
class MeetingScreenTest {
    private static final Look UNICODE = Look.of(true, true);

    @TempDir
    Path dir;
    private Path db;
    private final MeetingFixture.TestClock clock = new MeetingFixture.TestClock();

    @BeforeEach
    void workspace() throws Exception {
        db = MeetingFixture.create(dir);
    }

    private ScreenHarness open(String person) throws Exception {
        return ScreenHarness.open(db, person, 6, UNICODE, clock);
    }

    private List<Decision> ledger() {
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            return new Ledger(ws).entries(MeetingFixture.CYCLE);
        }
    }

    /** The item code on the agenda's selected row. */
    private static String selectedItem(ScreenHarness h) {
        for (int row = 0; row < h.lines().size(); row++) {
            if (h.reversed(3, row) && row > 0 && row < h.lines().size() - 1) {
                Matcher m = Pattern.compile("^.\\s*\\d+ (\\S+)").matcher(h.line(row));
                if (m.find()) {
                    return m.group(1);
                }
            }
        }
        throw new AssertionError("no selected agenda row:\n" + h.text());
    }

    @Test
    void agendaShowsEveryItemRankedWithItsNumbersAndTheCutLine() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String text = h.text();
            assertTrue(h.line(0).contains("cycle 2026-12") && h.line(0).contains("alice*"), h.line(0));
            assertTrue(text.contains("8 items"), text);
            assertTrue(text.contains("rank") && text.contains("stake") && text.contains("track"), text);
            for (String item : MeetingFixture.ITEMS) {
                assertTrue(text.contains(item), item + " listed:\n" + text);
            }
            // A 6-minute budget at the default 3 minutes an item reaches about two items.
            assertTrue(text.contains("cut line: the 6-minute budget runs out here"), text);
            assertTrue(h.rowOf("cut line") > h.rowOf("   1 "), text);
            assertTrue(h.line(h.lines().size() - 1).contains("Enter open"), "keys on the bottom line");
        }
    }

    @Test
    void movingSelectsTheNextRowAndEnterOpensTheItemAndEscGoesBack() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String first = selectedItem(h);
            h.press(KeyType.ArrowDown);
            String second = selectedItem(h);
            assertFalse(first.equals(second));
            h.type("j");
            h.press(KeyType.ArrowUp);
            assertEquals(second, selectedItem(h));
            h.press(KeyType.End);
            h.press(KeyType.Home);
            assertEquals(first, selectedItem(h));
            h.press(KeyType.ArrowDown).press(KeyType.Enter);
            assertTrue(h.line(1).startsWith(second), h.text());
            assertTrue(h.text().contains("period   lag     naive"), h.text());
            assertTrue(h.text().contains("2027-01") && h.text().contains("2027-03"), h.text());
            h.type("n");
            assertFalse(h.line(1).startsWith(second), "n moves to the next agenda item:\n" + h.text());
            h.type("p");
            assertTrue(h.line(1).startsWith(second), h.text());
            h.type("v");
            assertTrue(h.text().contains("the chart's numbers"), h.text());
            h.press(KeyType.Escape);
            assertTrue(h.line(0).contains("[agenda]"), h.line(0));
        }
    }

    @Test
    void filterKeepsMatchingRowsAndEscClearsIt() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("/B3");
            assertTrue(h.text().contains("filter: B3"), h.text());
            assertTrue(h.text().contains(" B3 "), h.text());
            assertFalse(h.text().contains(" A1 "), h.text());
            h.press(KeyType.Enter);
            assertEquals("B3", selectedItem(h));
            h.press(KeyType.Escape);
            assertTrue(h.text().contains(" A1 ") && h.text().contains(" B3 "), h.text());
        }
    }

    @Test
    void theFormSavesOneLedgerRowPerPeriodWithWhatWasTyped() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String item = selectedItem(h);
            h.press(KeyType.Enter);
            clock.advance(Duration.ofSeconds(90));
            h.type("a");
            assertTrue(h.text().contains("adjust " + item), h.text());
            assertTrue(h.text().contains("minutes  1.5"), "minutes prefilled from the time open:\n" + h.text());
            h.type("+10%");
            assertTrue(h.text().contains("(+10.0%) over 3 period(s)"), h.text());
            assertTrue(h.text().contains("similar decisions"), h.text());
            h.press(KeyType.Tab).type("buyer confirmed the promotion").press(KeyType.Tab).type("p");
            assertTrue(h.text().contains("price change"), h.text());
            h.press(KeyType.Enter);
            assertTrue(h.text().contains("saved: " + item), h.text());

            List<Decision> saved = ledger().stream().filter(d -> d.author().equals("alice")).toList();
            assertEquals(3, saved.size());
            for (Decision d : saved) {
                assertEquals(item, d.item());
                assertEquals("buyer confirmed the promotion", d.reason());
                assertEquals("price change", d.tag());
                assertEquals(h.meeting.info().id(), d.meeting());
                // +10% of the prior, to the millionth (Decide.scaled)
                assertEquals(d.prior().toBigDecimal().multiply(new java.math.BigDecimal("1.1"))
                        .setScale(6, java.math.RoundingMode.HALF_EVEN), d.quantity().toBigDecimal());
            }
            assertEquals(List.of("2027-01", "2027-02", "2027-03"),
                    saved.stream().map(d -> d.period().toString()).toList());
            assertEquals(Quantity.parse("1.5").micros(), saved.stream().mapToLong(d -> d.minutes().micros()).sum());
            assertTrue(h.text().contains("adjusted"), h.text());
        }
    }

    @Test
    void spaceTogglesPeriodsAndAnAbsoluteQuantityIsKeptAsTyped() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String item = selectedItem(h);
            h.type("a");
            h.press(KeyStroke.fromString("<s-Tab>")); // back to the periods
            h.press(KeyType.ArrowRight).type(" "); // 2026-12 (lag 0) is not preselected; the cursor moved to 2027-01
            h.press(KeyType.Tab).type("1250").press(KeyType.Tab).type("shelf reset in january").press(KeyType.Tab)
                    .press(KeyType.Tab).press(KeyType.Enter);
            List<Decision> saved = ledger().stream().filter(d -> d.author().equals("alice")).toList();
            assertEquals(List.of("2027-02", "2027-03"), saved.stream().map(d -> d.period().toString()).toList(),
                    h.text());
            assertTrue(saved.stream().allMatch(d -> d.quantity().equals(Quantity.parse("1250")) && d.item().equals(item)));
            assertTrue(saved.stream().allMatch(d -> d.tag().equals("other")));
        }
    }

    @Test
    void aFormWithoutAReasonSavesNothingAndSaysWhy() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("a").type("120").press(KeyType.Enter);
            assertTrue(h.line(h.lines().size() - 1).contains("say why in a few words"), h.text());
            h.press(KeyType.Tab).type("because").press(KeyType.Enter);
            assertTrue(h.text().contains("say why in a few words"), h.text());
            h.type(" event");
            h.press(KeyType.Enter);
            assertTrue(h.text().contains("tag \"other\": the reason must say what happened"), h.text());
            assertTrue(ledger().stream().noneMatch(d -> d.author().equals("alice")), "nothing saved yet");
            h.type(" happened").press(KeyType.Enter);
            assertEquals(3, ledger().stream().filter(d -> d.reason().equals("because event happened")).count(), h.text());
        }
    }

    @Test
    void escOnAFormWithInputAsksBeforeDiscarding() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("a").type("99");
            h.press(KeyType.Escape);
            assertTrue(h.text().contains("Esc again discards"), h.text());
            h.press(KeyType.Escape);
            assertFalse(h.line(0).contains("[adjust"), h.line(0));
            assertTrue(ledger().stream().noneMatch(d -> d.author().equals("alice")));
        }
    }

    @Test
    void unsavedInputComesBackAfterTheScreenWentAway() throws Exception {
        String item;
        try (ScreenHarness h = open("alice")) {
            item = selectedItem(h);
            h.type("a").type("-15%").press(KeyType.Tab).type("customer halved the order");
            // the connection drops here: the screen is gone without saving
        }
        try (ScreenHarness again = open("alice")) {
            assertEquals(item, selectedItem(again));
            again.type("a");
            assertTrue(again.text().contains("your unsaved input on " + item + " is back"), again.text());
            assertTrue(again.text().contains("quantity -15%"), again.text());
            assertTrue(again.text().contains("customer halved the order"), again.text());
            again.press(KeyType.Enter);
            assertEquals(3, ledger().stream().filter(d -> d.reason().equals("customer halved the order")).count());
        }
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            assertTrue(new org.plenum.store.Meetings(ws).draftItems(1, "alice").isEmpty(), "a saved form leaves no draft");
        }
    }

    @Test
    void keepRecordsReviewedNoChangeForTheDecisionPeriods() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String item = selectedItem(h);
            h.type("k");
            assertTrue(h.text().contains(item + " kept for 2027-01, 2027-02, 2027-03"), h.text());
            List<Decision> kept = ledger().stream().filter(d -> d.author().equals("alice")).toList();
            assertEquals(3, kept.size());
            assertTrue(kept.stream().allMatch(d -> d.kept() && d.quantity().equals(d.prior())));
            assertTrue(h.text().contains("kept"), h.text());
        }
    }

    @Test
    void tablingMovesAFollowingPlannerToTheItemAndDecisionsAppearOnEveryScreen() throws Exception {
        try (ScreenHarness facilitator = open("alice"); ScreenHarness planner = open("bob")) {
            assertTrue(planner.line(0).contains("alice* bob"), planner.line(0));
            planner.type("t");
            assertTrue(planner.text().contains("only the facilitator (alice) tables items"), planner.text());
            facilitator.press(KeyType.ArrowDown);
            String item = selectedItem(facilitator);
            facilitator.type("t");
            planner.step();
            assertTrue(planner.line(0).contains("[item " + item + "]"), planner.line(0));
            assertTrue(planner.line(0).contains("table: " + item), planner.line(0));
            planner.type("a").type("+5%").press(KeyType.Tab).type("new listing at a big retailer").press(KeyType.Enter);
            facilitator.type("2");
            assertTrue(facilitator.text().contains("this meeting's decisions: 3 standing"), facilitator.text());
            assertTrue(facilitator.text().contains("bob") && facilitator.text().contains("new listing at a big retailer"),
                    facilitator.text());
            planner.type("f");
            assertTrue(planner.text().contains("not following"), planner.text());
        }
    }

    /** The item on the agenda row of {@code rank}, as the screen shows it. */
    private static String itemAtRank(ScreenHarness h, int rank) {
        Pattern row = Pattern.compile("^.\\s*(\\d+) (\\S+)\\s");
        for (String line : h.lines()) {
            Matcher m = row.matcher(line);
            if (m.find() && Integer.parseInt(m.group(1)) == rank) {
                return m.group(2);
            }
        }
        throw new AssertionError("no agenda row of rank " + rank + ":\n" + h.text());
    }

    private static String lastNotHandsOff(ScreenHarness h) {
        String last = null;
        for (int rank = 1; rank <= MeetingFixture.ITEMS.size(); rank++) {
            String item = itemAtRank(h, rank);
            if (!h.line(h.rowOf(" " + item + " ")).startsWith("!")) {
                last = item;
            }
        }
        assertTrue(last != null && !last.equals(itemAtRank(h, 1)), "the fixture ranks two items that are not hands off");
        return last;
    }

    @Test
    void theAgendaStaysAsRankedUntilTheFacilitatorRanksItAgainAndThenEveryScreenShowsTheNewOne() throws Exception {
        try (ScreenHarness facilitator = open("alice"); ScreenHarness planner = open("bob")) {
            String first = itemAtRank(facilitator, 1);
            assertEquals(first, itemAtRank(planner, 1), "both screens show the meeting's one agenda");
            // Corrected statistical forecasts arrive during the meeting: the last-ranked item that
            // is not hands off (those stay last whatever their stake) had recent forecasts ten
            // times too high, so ranked afresh it comes first.
            String last = lastNotHandsOff(facilitator);
            int i = MeetingFixture.ITEMS.indexOf(last);
            StringBuilder csv = new StringBuilder("item,period,cycle,step,quantity\n");
            for (Period c = MeetingFixture.CYCLE.plus(-8); c.compareTo(MeetingFixture.CYCLE) < 0; c = c.plus(1)) {
                for (int lag = 1; lag <= 3; lag++) {
                    csv.append(last).append(',').append(c.plus(lag)).append(',').append(c).append(",stat,")
                            .append(10 * MeetingFixture.demand(i, c.plus(lag))).append('\n');
                }
            }
            try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
                new CsvImporter(ws, Progress.NONE).importFile(ImportKind.FORECASTS,
                        TestWorkspace.write(dir, "late.csv", csv.toString()), true);
            }
            facilitator.step();
            planner.step();
            assertEquals(first, itemAtRank(facilitator, 1), "data arriving do not reorder the meeting's agenda");
            assertEquals(first, itemAtRank(planner, 1));

            planner.type("R");
            assertTrue(planner.text().contains("only the facilitator (alice) ranks the agenda again"), planner.text());
            facilitator.type("R");
            assertTrue(facilitator.text().contains("the agenda is ranked again: 8 items"), facilitator.text());
            assertEquals(last, itemAtRank(facilitator, 1), facilitator.text());
            planner.step();
            assertEquals(last, itemAtRank(planner, 1), planner.text());
            assertTrue(planner.text().contains("the facilitator ranked the agenda again"), planner.text());
        }
    }

    @Test
    void aCorrectionSupersedesAndTheLedgerViewMarksIt() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("a").type("200").press(KeyType.Tab).type("first guess at the size").press(KeyType.Enter);
            h.type("a").type("210").press(KeyType.Tab).type("corrected after the call").press(KeyType.Enter);
            h.type("2");
            assertTrue(h.text().contains("3 standing, 3 corrected"), h.text());
            int newest = h.rowOf("corrected after the call");
            int older = h.rowOf("(corrected) first guess");
            assertTrue(newest > 0 && older > newest, "newest first:\n" + h.text());
            h.press(KeyType.Enter);
            assertTrue(h.line(0).contains("[item "), h.line(0));
        }
    }

    @Test
    void scorecardViewShowsEveryStepAgainstThePlacebo() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("3");
            String text = h.text();
            assertTrue(text.contains("process scorecard, lag 1, against the naive placebo"), text);
            for (String step : List.of("naive", "stat", "meeting", "final")) {
                assertTrue(h.rowOf(step + " ") > 0, step + ":\n" + text);
            }
            h.type("1");
            assertTrue(h.line(0).contains("[agenda]"));
        }
    }

    @Test
    void helpListsTheKeysOfTheViewAndAnyKeyClosesIt() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("?");
            assertTrue(h.text().contains("keys: agenda"), h.text());
            assertTrue(h.text().contains("table the item (facilitator)"), h.text());
            assertTrue(h.text().contains("close the meeting"), h.text());
            h.type("x");
            assertFalse(h.text().contains("keys: agenda"), h.text());
        }
    }

    @Test
    void quitAsksFirst() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("q");
            assertTrue(h.text().contains("q again to quit"), h.text());
            h.type("j");
            assertFalse(h.screen.finished());
            h.type("qq");
            assertTrue(h.screen.finished());
        }
    }

    @Test
    void closingTheMeetingWritesItsMinutesAndForecast() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String item = selectedItem(h);
            h.type("t").type("a").type("+20%").press(KeyType.Tab).type("promotion agreed with the buyer")
                    .press(KeyType.Enter);
            clock.advance(Duration.ofMinutes(7));
            h.type("X");
            assertTrue(h.text().contains("close the meeting and write its minutes?"), h.text());
            h.type("y");
            assertTrue(h.text().contains("closed after 7 min"), h.text());
            assertTrue(h.line(0).contains("CLOSED"), h.line(0));
            Path minutes = dir.resolve("2026-12-meeting-1-minutes.md");
            String md = Files.readString(minutes);
            assertTrue(md.contains("# Minutes of the demand review, cycle 2026-12"), md);
            assertTrue(md.contains("1. **" + item + "**: adjusted"), md);
            assertTrue(md.contains("promotion agreed with the buyer"), md);
            assertTrue(md.contains("7 minutes of a 6-minute budget (1 over)"), md);
            assertTrue(md.contains("## Not reached (below the cut line)"), md);
            List<String> forecast = Files.readAllLines(dir.resolve("2026-12-meeting-1-forecast.csv"));
            assertEquals("item,period,cycle,step,quantity", forecast.get(0));
            assertTrue(forecast.stream().anyMatch(l -> l.startsWith(item + ",2027-01,2026-12,meeting,")), forecast.toString());
        }
    }

    @Test
    void onlyTheFacilitatorClosesTheMeeting() throws Exception {
        try (ScreenHarness facilitator = open("alice"); ScreenHarness planner = open("bob")) {
            planner.type("X");
            assertTrue(planner.text().contains("only the facilitator closes the meeting"), planner.text());
        }
    }

    @Test
    void fourShowsTheItemWithoutTheKeyLine() throws Exception {
        try (ScreenHarness h = open("alice")) {
            String item = selectedItem(h);
            h.type("4");
            assertTrue(h.line(0).contains("[item " + item + "]"), h.line(0));
            assertEquals("", h.line(h.lines().size() - 1).strip(), "no key hints on the shared full view");
        }
    }

    @Test
    void fitsEightyByTwentyFourAndFollowsAResize() throws Exception {
        try (ScreenHarness h = ScreenHarness.open(db, "alice", 6, UNICODE, clock, new TerminalSize(80, 24))) {
            assertTrue(h.text().contains(" A1 ") || h.text().contains(" B1 "), h.text());
            assertFalse(h.text().contains("history"), "no sparkline column at 80 columns:\n" + h.text());
            h.terminal.setTerminalSize(new TerminalSize(140, 30));
            h.step();
            assertTrue(h.text().contains("history") && h.text().contains("description"), h.text());
            assertEquals(30, h.lines().size());
            h.type("a");
            h.terminal.setTerminalSize(new TerminalSize(80, 24));
            h.step();
            assertTrue(h.text().contains("adjust "), h.text());
            assertTrue(h.lines().stream().allMatch(l -> l.length() <= 80));
        }
    }

    @Test
    void asciiAndNoColourDrawOnlyPlainCharactersAndMarkTheSelectionInReverse() throws Exception {
        Look plain = Look.fromEnvironment(Map.of("LANG", "C", "NO_COLOR", "1"), false);
        assertFalse(plain.unicode());
        assertFalse(plain.colour());
        try (ScreenHarness h = ScreenHarness.open(db, "alice", 6, plain, clock)) {
            h.press(KeyType.Enter);
            String text = h.text();
            assertTrue(text.chars().allMatch(ch -> ch < 128), "ASCII only:\n" + text);
            assertTrue(text.contains("#"), "bars drawn with #:\n" + text);
            h.press(KeyType.Escape);
            assertTrue(text.length() > 0);
            int row = h.rowOf(selectedItem(h));
            assertTrue(h.reversed(3, row));
        }
        assertTrue(Look.fromEnvironment(Map.of("LC_ALL", "en_GB.UTF-8"), false).unicode());
        assertFalse(Look.fromEnvironment(Map.of("LC_ALL", "en_GB.UTF-8"), true).unicode(), "--ascii wins");
    }

    @Test
    void aKeyWithNoMeaningHereSaysSo() throws Exception {
        try (ScreenHarness h = open("alice")) {
            h.type("z");
            assertTrue(h.text().contains("that key does nothing here"), h.text());
        }
    }

    @Test
    void theClockRunsAndTheScreenChecksIn() throws Exception {
        try (ScreenHarness h = open("alice")) {
            clock.advance(Duration.ofSeconds(75));
            h.screen.tick();
            h.step();
            assertTrue(h.line(0).contains("1:15 of 6:00"), h.line(0));
            try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
                assertEquals(clock.instant(), new org.plenum.store.Meetings(ws).people(1).get(0).seenAt());
            }
        }
    }

    @Test
    void periodsOfTheFixtureAreWhatTheTestsAssume() {
        assertEquals(Period.month(2027, 1), MeetingFixture.CYCLE.plus(1));
    }
}
