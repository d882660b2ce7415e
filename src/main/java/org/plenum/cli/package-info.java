/**
 * The {@code plenum} command line: one thin picocli class per subcommand over app, the exit-code
 * mapping and the output formats. Prints; computes nothing.
 */
package org.plenum.cli;
