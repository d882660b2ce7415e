package org.plenum.io;

import java.nio.file.Path;
import java.time.Duration;

/** A file imported: how many rows, and how long it took from opening the file to the commit. */
public record ImportResult(ImportKind kind, Path file, long rows, Duration elapsed) {}
