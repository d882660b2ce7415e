package org.plenum.core;

import java.util.List;

/**
 * Input data that Plenum refuses, with one message per problem, each saying where it is and
 * what was expected. Nothing was changed when this is thrown.
 */
public final class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> problems;

    public BadInputException(List<String> problems) {
        super(String.join("\n", problems));
        this.problems = List.copyOf(problems);
    }

    public BadInputException(String problem) {
        this(List.of(problem));
    }

    public List<String> problems() {
        return problems;
    }
}
