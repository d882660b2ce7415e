package org.plenum.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.plenum.core.BadInputException;

/**
 * The problems found in one file, kept in line order and capped: a file with a systematic
 * mistake would otherwise print a million lines. Safe to add to from the reading and the
 * writing thread at once.
 */
final class ImportErrors {
    static final int SHOWN = 20;
    private final String file;
    private final List<ImportError> errors = new ArrayList<>();
    private int total;

    ImportErrors(String file) {
        this.file = file;
    }

    synchronized void add(int line, int column, String message) {
        total++;
        errors.add(new ImportError(file, line, column, message));
        if (errors.size() > 4 * SHOWN) {
            Collections.sort(errors);
            errors.subList(SHOWN, errors.size()).clear();
        }
    }

    synchronized boolean any() {
        return total > 0;
    }

    /** @throws BadInputException listing the first problems by line, when there are any */
    synchronized void throwIfAny() {
        if (total == 0) {
            return;
        }
        Collections.sort(errors);
        List<String> lines = new ArrayList<>();
        errors.stream().limit(SHOWN).forEach(e -> lines.add(e.toString()));
        if (total > SHOWN) {
            lines.add(file + ": ... and " + (total - SHOWN) + " more problems (" + total + " in all)");
        }
        lines.add(file + ": nothing was imported");
        throw new BadInputException(lines);
    }
}
