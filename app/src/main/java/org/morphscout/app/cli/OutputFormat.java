package org.morphscout.app.cli;

import picocli.CommandLine.Option;

/** The mutually exclusive --json / --csv choice of commands that list rows. */
final class OutputFormat {
  @Option(names = "--json", description = "Write JSON to stdout.")
  boolean json;

  @Option(names = "--csv", description = "Write CSV (RFC 4180) to stdout.")
  boolean csv;
}
