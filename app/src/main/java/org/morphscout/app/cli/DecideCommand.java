package org.morphscout.app.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout decide FIRST SECOND approve|reject}, or {@code --clear}: record or clear a decision on a pair. */
@Command(
    name = "decide",
    mixinStandardHelpOptions = true,
    header = "Record your decision on a pair of catalog images (approve or reject, with a note), or clear it.",
    description = "The decision is kept with both pictures' content hashes: it survives renames and moves, and a "
        + "different picture put at an old path does not inherit it. Deciding again replaces the earlier decision; "
        + "--clear removes it (the order of the two images does not matter); the browser's Clear decision does the "
        + "same.")
final class DecideCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "<first>", description = "First image (a path in the catalog).")
  String first;

  @Parameters(index = "1", paramLabel = "<second>", description = "Second image.")
  String second;

  @Parameters(index = "2", arity = "0..1", paramLabel = "approve|reject",
      description = "Your decision (leave it out with --clear).")
  String decision;

  @Option(names = "--clear", description = "Clear the decision on the pair instead of recording one.")
  boolean clear;

  @Option(names = "--note", paramLabel = "<text>", description = "A note kept with the decision.")
  String note;

  @Option(names = "--json", description = "Write JSON to stdout.")
  boolean json;

  /** The decision word as a usage error (exit 2) when it is neither approve(d) nor reject(ed). */
  static DecisionKind decision(CommandSpec spec, String what, String word) {
    try {
      return DecisionKind.parse(word);
    } catch (org.morphscout.indexer.MorphscoutException e) {
      throw OptionCheck.of(spec).fail(what + " must be approve or reject, got '" + Terminal.safe(word) + "'");
    }
  }

  @Override
  public Integer call() throws Exception {
    if (clear && (decision != null || note != null)) {
      throw OptionCheck.of(spec).fail("--clear takes no decision and no --note: decide FIRST SECOND --clear");
    }
    if (!clear && decision == null) {
      throw OptionCheck.of(spec).fail("say approve or reject, or --clear to remove the decision");
    }
    DecisionKind v = clear ? null : decision(spec, "approve|reject", decision);
    try (Library library = Library.openExisting(root.catalogDir())) {
      ImageRow ra = library.require(first);
      ImageRow rb = library.require(second);
      boolean hadOne = false;
      if (clear) {
        hadOne = library.decisions().clear(ra.id(), rb.id());
      } else {
        library.decisions().decide(ra.id(), rb.id(), v, note);
      }
      if (json) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("first", ra.path());
        doc.put("second", rb.path());
        doc.put("decision", clear ? null : v.word());
        if (clear) {
          doc.put("cleared", hadOne);
        } else {
          doc.put("note", note);
        }
        JsonOut.write(spec.commandLine().getOut(), doc);
      } else if (clear) {
        spec.commandLine().getOut().printf("%s: %s <-> %s%n", hadOne ? "cleared" : "no decision to clear",
            Terminal.safe(ra.path()), Terminal.safe(rb.path()));
      } else {
        spec.commandLine().getOut().printf("%s: %s <-> %s%s%n", v.word(), Terminal.safe(ra.path()),
            Terminal.safe(rb.path()), note == null ? "" : "  (" + Terminal.safe(note) + ")");
      }
      return ExitCodes.OK;
    }
  }
}
