package org.morphscout.app.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.catalog.DecisionStore.Verdict;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.library.Library;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout decide A B approve|reject}: record a verdict on a pair. */
@Command(
    name = "decide",
    mixinStandardHelpOptions = true,
    header = "Record your verdict on a pair of catalog images (approve or reject, with a note).",
    description = {"The verdict is kept with both pictures' content hashes: it survives renames and moves, and a",
        "different picture put at an old path does not inherit it. Deciding again replaces the earlier verdict."})
final class DecideCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "<imageA>", description = "First image (a path in the catalog).")
  String a;

  @Parameters(index = "1", paramLabel = "<imageB>", description = "Second image.")
  String b;

  @Parameters(index = "2", paramLabel = "approve|reject", description = "Your verdict.")
  String verdict;

  @Option(names = "--note", paramLabel = "<text>", description = "A note kept with the verdict.")
  String note;

  @Option(names = "--json", description = "Write JSON to stdout.")
  boolean json;

  /** The verdict word as a usage error (exit 2) when it is neither approve(d) nor reject(ed). */
  static Verdict verdict(CommandSpec spec, String what, String word) {
    try {
      return Verdict.parse(word);
    } catch (org.morphscout.indexer.MorphscoutException e) {
      throw OptionCheck.of(spec).fail(what + " must be approve or reject, got '" + Terminal.safe(word) + "'");
    }
  }

  @Override
  public Integer call() throws Exception {
    Verdict v = verdict(spec, "approve|reject", verdict);
    try (Library library = Library.openExisting(root.catalogDir())) {
      ImageRow ra = library.require(a);
      ImageRow rb = library.require(b);
      library.decisions().decide(ra.id(), rb.id(), v, note);
      if (json) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("a", ra.path());
        doc.put("b", rb.path());
        doc.put("verdict", v.word());
        doc.put("note", note);
        JsonOut.write(spec.commandLine().getOut(), doc);
      } else {
        spec.commandLine().getOut().printf("%s: %s <-> %s%s%n", v.word(), Terminal.safe(ra.path()),
            Terminal.safe(rb.path()), note == null ? "" : "  (" + Terminal.safe(note) + ")");
      }
      return ExitCodes.OK;
    }
  }
}
