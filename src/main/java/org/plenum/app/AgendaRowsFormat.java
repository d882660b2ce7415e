package org.plenum.app;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.BufferUnderflowException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.Candidate;
import org.plenum.agenda.Stake;
import org.plenum.agenda.TrackRecord;
import org.plenum.score.Evidence;

/**
 * A ranked agenda as one value, to be kept with its meeting (format {@value #VERSION}), and read
 * back exactly: big-endian; doubles as their IEEE 754 bits; an optional value behind a byte that
 * says whether it is there; strings as their UTF-8 length and bytes. Strings that repeat from row
 * to row (groups, tags, the words of a stake's basis, an evidence, a pool, ABC and XYZ) are
 * written once, in a table at the start, and rows refer to them by number, so that reading fifty
 * thousand rows makes two strings per row, not twelve.
 *
 * <p>Layout: {@code int count; int words; words × text; count × row}, a row being rank, item id,
 * code, description, group (word or −1), unit value (optional long), target periods
 * ({@code int n; n × int}), tags ({@code int n; n × word}), stake value, stake MAE (optional
 * doubles), basis (word), periods (int), unit value (optional double), own record (optional
 * double), n (long), parent, shrunk (doubles), evidence (word), p-value (optional double), pairs
 * (int), pool (word), priority (optional double), abc, xyz (words), cv (optional double), event
 * factor, expected minutes (doubles), above the cut (byte: 0 no, 1 yes, 2 no cut line).
 */
final class AgendaRowsFormat {
    static final int VERSION = 1;

    private AgendaRowsFormat() {}

    static byte[] encode(List<AgendaRow> rows) {
        Map<String, Integer> words = new LinkedHashMap<>();
        Function<String, Integer> word = w -> words.computeIfAbsent(w, k -> words.size());
        ByteArrayOutputStream body = new ByteArrayOutputStream(rows.size() * 160 + 16);
        try (DataOutputStream out = new DataOutputStream(body)) {
            for (AgendaRow r : rows) {
                Candidate item = r.item();
                Stake stake = r.stake();
                TrackRecord track = r.trackRecord();
                out.writeInt(r.rank());
                out.writeInt(item.id());
                text(out, item.code());
                text(out, item.description());
                out.writeInt(item.group() == null ? -1 : word.apply(item.group()));
                out.writeBoolean(item.unitValueMicros() != null);
                if (item.unitValueMicros() != null) {
                    out.writeLong(item.unitValueMicros());
                }
                out.writeInt(item.targetPeriods().length);
                for (int p : item.targetPeriods()) {
                    out.writeInt(p);
                }
                out.writeInt(item.tags().size());
                for (String tag : item.tags()) {
                    out.writeInt(word.apply(tag));
                }
                optional(out, stake.value());
                optional(out, stake.mae());
                out.writeInt(word.apply(stake.basis().word()));
                out.writeInt(stake.periods());
                optional(out, stake.unitValue());
                optional(out, track.own());
                out.writeLong(track.n());
                out.writeDouble(track.parent());
                out.writeDouble(track.shrunk());
                out.writeInt(word.apply(track.evidence().label().text()));
                optional(out, track.evidence().pValue());
                out.writeInt(track.evidence().pairs());
                out.writeInt(word.apply(track.pool().word()));
                optional(out, r.priority());
                out.writeInt(word.apply(r.abc()));
                out.writeInt(word.apply(r.xyz()));
                optional(out, r.cv());
                out.writeDouble(r.eventFactor());
                out.writeDouble(r.expectedMinutes());
                out.writeByte(r.aboveCut().map(above -> above ? 1 : 0).orElse(2));
            }
            ByteArrayOutputStream whole = new ByteArrayOutputStream(body.size() + words.size() * 16 + 8);
            DataOutputStream head = new DataOutputStream(whole);
            head.writeInt(rows.size());
            head.writeInt(words.size());
            for (String w : words.keySet()) {
                text(head, w);
            }
            body.writeTo(head);
            head.flush();
            return whole.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("a byte array cannot fail to grow: " + e.getMessage(), e);
        }
    }

    /** @throws IllegalArgumentException when {@code value} is not a whole agenda of this format */
    static List<AgendaRow> decode(byte[] value) {
        try {
            ByteBuffer in = ByteBuffer.wrap(value);
            int count = in.getInt();
            String[] words = new String[in.getInt()];
            for (int i = 0; i < words.length; i++) {
                words[i] = text(in);
            }
            Words lookup = new Words(words);
            List<AgendaRow> rows = new ArrayList<>(count);
            for (int k = 0; k < count; k++) {
                rows.add(row(in, lookup));
            }
            if (in.hasRemaining()) {
                throw new IllegalArgumentException(in.remaining() + " bytes after the last row");
            }
            return rows;
        } catch (BufferUnderflowException | IndexOutOfBoundsException | NegativeArraySizeException e) {
            throw new IllegalArgumentException("it ends early or holds a wrong length (" + e + ")", e);
        }
    }

    private static AgendaRow row(ByteBuffer in, Words words) {
        int rank = in.getInt();
        int itemId = in.getInt();
        String code = text(in);
        String description = text(in);
        int group = in.getInt();
        Long unitValueMicros = in.get() == 1 ? in.getLong() : null;
        int[] periods = new int[in.getInt()];
        for (int i = 0; i < periods.length; i++) {
            periods[i] = in.getInt();
        }
        String[] tags = new String[in.getInt()];
        for (int i = 0; i < tags.length; i++) {
            tags[i] = words.at(in.getInt());
        }
        Candidate item = new Candidate(itemId, code, description, group < 0 ? null : words.at(group), unitValueMicros,
                periods, Arrays.asList(tags));
        Stake stake = new Stake(optional(in), optional(in), words.of(Stake.Basis.values(), Stake.Basis::word,
                in.getInt()), in.getInt(), optional(in));
        OptionalDouble own = optional(in);
        long n = in.getLong();
        double parent = in.getDouble();
        double shrunk = in.getDouble();
        Evidence evidence = new Evidence(words.of(Evidence.Label.values(), Evidence.Label::text, in.getInt()),
                optional(in), in.getInt());
        TrackRecord track = new TrackRecord(own, n, parent, shrunk, evidence,
                words.of(TrackRecord.Pool.values(), TrackRecord.Pool::word, in.getInt()));
        OptionalDouble priority = optional(in);
        String abc = words.at(in.getInt());
        String xyz = words.at(in.getInt());
        OptionalDouble cv = optional(in);
        double eventFactor = in.getDouble();
        double expectedMinutes = in.getDouble();
        byte cut = in.get();
        return new AgendaRow(rank, item, stake, track, priority, abc, xyz, cv, eventFactor, expectedMinutes,
                cut == 2 ? Optional.empty() : Optional.of(cut == 1));
    }

    /** The table of repeated strings, and the enum constant each word names. */
    private record Words(String[] all) {
        String at(int index) {
            return all[index];
        }

        <E> E of(E[] values, Function<E, String> word, int index) {
            String text = at(index);
            for (E v : values) {
                if (word.apply(v).equals(text)) {
                    return v;
                }
            }
            throw new IllegalArgumentException("an unknown word: " + text);
        }
    }

    private static void text(DataOutputStream out, String value) throws IOException {
        byte[] bytes = value.getBytes(StandardCharsets.UTF_8);
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    private static String text(ByteBuffer in) {
        int length = in.getInt();
        String s = new String(in.array(), in.position(), length, StandardCharsets.UTF_8);
        in.position(in.position() + length);
        return s;
    }

    private static void optional(DataOutputStream out, OptionalDouble value) throws IOException {
        out.writeBoolean(value.isPresent());
        if (value.isPresent()) {
            out.writeDouble(value.getAsDouble());
        }
    }

    private static OptionalDouble optional(ByteBuffer in) {
        return in.get() == 1 ? OptionalDouble.of(in.getDouble()) : OptionalDouble.empty();
    }
}
