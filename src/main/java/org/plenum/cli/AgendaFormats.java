package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.AgendaSettings;
import org.plenum.agenda.TrackRecord;
import org.plenum.app.Agenda;
import org.plenum.io.LedgerCsv;

/** The agenda as an 80-column table, CSV or JSON (the column contract of DESIGN §6). Display only. */
final class AgendaFormats {
    /** DESIGN §6's contract, in order; extra columns follow it. */
    static final List<String> COLUMNS = List.of("rank", "item", "description", "group", "stake", "track_record",
            "track_n", "gain", "priority", "abc", "xyz", "tags", "hands_off", "expected_minutes", "above_cut");
    static final List<String> EXTRA_COLUMNS = List.of("own_ratio", "group_ratio", "evidence", "evidence_pool",
            "p_value", "mae", "stake_basis", "periods", "unit_value", "event_factor", "cv");
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\r\n").get();
    private static final int WIDTH = 80;

    private final Agenda.Report report;
    private final AgendaSettings settings;
    private final List<AgendaRow> shown;

    AgendaFormats(Agenda.Report report, AgendaSettings settings, int limit) {
        this.report = report;
        this.settings = settings;
        this.shown = report.rows().subList(0, Math.min(limit, report.rows().size()));
    }

    void table(PrintWriter out) {
        out.printf(Locale.ROOT, "Agenda for %s: %s forecasts at lags %s, %,d candidates%s%n", report.cycle(),
                report.statStep(), lagText(), report.rows().size(),
                shown.size() < report.rows().size() ? " (first " + shown.size() + " shown)" : "");
        out.printf(Locale.ROOT, "ABC by %s (%s), XYZ by CV (%s), over the season before the cycle%n",
                report.byValue() ? "value" : "volume", percents(settings.abc()), decimals(settings.xyz()));
        String format = "%4s %-10s %-7s %9s %5s %4s %5s %9s %-2s %4s %s%n";
        out.printf(Locale.ROOT, format, "rank", "item", "group", "stake", "track", "n", "gain", "priority", "cl", "min",
                "tags");
        boolean cutDrawn = false;
        for (AgendaRow r : shown) {
            if (!cutDrawn && r.aboveCut().isPresent() && !r.aboveCut().get() && !r.handsOff()) {
                out.println(clip(String.format(Locale.ROOT, "---- cut: the %s-minute budget ends here "
                        + "-------------------------------------", number(settings.budgetMinutes(), 0)), WIDTH));
                cutDrawn = true;
            }
            String tags = r.handsOff() ? "HANDS OFF" : String.join(";", r.tags());
            String line = String.format(Locale.ROOT, format, r.rank(), clip(r.code(), 10),
                    clip(r.item().group() == null ? "-" : r.item().group(), 7), grouped(r.stake().value()),
                    number(OptionalDouble.of(r.trackRecord().shrunk()), 3), r.trackRecord().n(),
                    number(OptionalDouble.of(r.trackRecord().gain()), 2), grouped(r.priority()), r.abc() + r.xyz(),
                    String.format(Locale.ROOT, "%.1f", r.expectedMinutes()), tags);
            out.println(clip(line.stripTrailing(), WIDTH));
        }
        handsOffNotes(out);
        legend(out);
    }

    private void handsOffNotes(PrintWriter out) {
        for (AgendaRow r : shown) {
            if (r.handsOff()) {
                TrackRecord t = r.trackRecord();
                out.println(clip(String.format(Locale.ROOT, "hands off %s: review made the forecast worse"
                        + " (evidence of the %s: %,d pairs, p %s)", r.code(), t.pool().word(), t.evidence().pairs(),
                        pValue(t.evidence().pValue())), WIDTH));
            }
        }
    }

    private void legend(PrintWriter out) {
        out.println("stake = recent MAE x periods x unit value (else units); track = shrunk AvgRelMAE");
        out.println("of reviewed against " + report.statStep() + " (below 1: review helped), n = changed pairs;");
        out.println(String.format(Locale.ROOT, "priority = stake x max(1 - track, %s), x %s with an event tag;"
                + " min = minutes", trim(settings.gainFloor()), trim(settings.eventFactor())));
    }

    void csv(PrintWriter out) {
        try {
            CSVPrinter printer = new CSVPrinter(out, FORMAT);
            List<String> header = new ArrayList<>(COLUMNS);
            header.addAll(EXTRA_COLUMNS);
            printer.printRecord(header);
            for (AgendaRow r : shown) {
                printer.printRecord(csvRow(r));
            }
            printer.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private List<String> csvRow(AgendaRow r) {
        TrackRecord t = r.trackRecord();
        return List.of(Integer.toString(r.rank()), LedgerCsv.text(r.code()), LedgerCsv.text(r.item().description()),
                r.item().group() == null ? "" : LedgerCsv.text(r.item().group()), plain(r.stake().value()),
                plain(OptionalDouble.of(t.shrunk())), Long.toString(t.n()), plain(OptionalDouble.of(t.gain())),
                plain(r.priority()), r.abc(), r.xyz(), LedgerCsv.text(String.join(";", r.tags())),
                Boolean.toString(r.handsOff()), plain(OptionalDouble.of(r.expectedMinutes())),
                r.aboveCut().map(Object::toString).orElse(""), plain(t.own()), plain(OptionalDouble.of(t.parent())),
                t.evidence().label().text(), t.pool().word(), plain(t.evidence().pValue()), plain(r.stake().mae()),
                r.stake().basis().word(), Integer.toString(r.stake().periods()), plain(r.stake().unitValue()),
                plain(OptionalDouble.of(r.eventFactor())), plain(r.cv()));
    }

    void json(PrintWriter out) {
        Json j = new Json().open().field("cycle", report.cycle().toString()).field("step", report.statStep())
                .openArray("lags");
        for (int lag : report.lags()) {
            j.value(lag);
        }
        j.closeArray().field("candidates", report.rows().size()).field("abc_basis", report.byValue() ? "value" : "volume")
                .field("budget_minutes", settings.budgetMinutes()).openArray("rows");
        for (AgendaRow r : shown) {
            TrackRecord t = r.trackRecord();
            j.open().field("rank", r.rank()).field("item", r.code()).field("description", r.item().description())
                    .field("group", r.item().group()).field("stake", r.stake().value())
                    .field("track_record", OptionalDouble.of(t.shrunk())).field("track_n", t.n())
                    .field("gain", OptionalDouble.of(t.gain())).field("priority", r.priority()).field("abc", r.abc())
                    .field("xyz", r.xyz()).openArray("tags");
            r.tags().forEach(j::value);
            j.closeArray().field("hands_off", r.handsOff())
                    .field("expected_minutes", OptionalDouble.of(r.expectedMinutes()))
                    .field("above_cut", r.aboveCut().orElse(null)).field("own_ratio", t.own())
                    .field("group_ratio", OptionalDouble.of(t.parent())).field("evidence", t.evidence().label().text())
                    .field("evidence_pool", t.pool().word()).field("p_value", t.evidence().pValue())
                    .field("mae", r.stake().mae()).field("stake_basis", r.stake().basis().word())
                    .field("periods", r.stake().periods()).field("unit_value", r.stake().unitValue())
                    .field("event_factor", OptionalDouble.of(r.eventFactor())).field("cv", r.cv()).close();
        }
        out.println(j.closeArray().close());
    }

    private String lagText() {
        int[] lags = report.lags();
        boolean range = lags.length > 1 && lags[lags.length - 1] - lags[0] == lags.length - 1;
        if (range) {
            return lags[0] + "-" + lags[lags.length - 1];
        }
        List<String> parts = new ArrayList<>();
        for (int lag : lags) {
            parts.add(Integer.toString(lag));
        }
        return String.join(",", parts);
    }

    private static String percents(double[] shares) {
        return trim(100 * shares[0]) + "/" + trim(100 * shares[1]) + "%";
    }

    private static String decimals(double[] values) {
        return trim(values[0]) + "/" + trim(values[1]);
    }

    private static String trim(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** Plain decimal, never in exponent form (spreadsheets and other tools read it as typed). */
    private static String plain(OptionalDouble v) {
        return v.isPresent() && Double.isFinite(v.getAsDouble())
                ? BigDecimal.valueOf(v.getAsDouble()).toPlainString() : "";
    }

    private static String grouped(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%,.0f", v.getAsDouble()) : "-";
    }

    private static String number(OptionalDouble v, int decimals) {
        return v.isPresent() ? String.format(Locale.ROOT, "%." + decimals + "f", v.getAsDouble()) : "-";
    }

    private static String pValue(OptionalDouble p) {
        if (p.isEmpty()) {
            return "-";
        }
        return p.getAsDouble() < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "= %.3f", p.getAsDouble());
    }

    private static String clip(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "~";
    }
}
