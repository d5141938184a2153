package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.CatalogLocation;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;
import picocli.CommandLine.Spec;
import picocli.CommandLine;

/** The root command: global options and the list of subcommands. */
@Command(
    name = "morphscout",
    mixinStandardHelpOptions = true,
    versionProvider = VersionProvider.class,
    header = "Find which images of your library morph well, and in what order, before you render.",
    description = {
      "Indexes your own image library on the CPU, scores how morph-friendly pairs are, finds chains of similar real "
          + "images between two endpoints, orders sets into smooth walks, and previews and exports your "
          + "choices.",
      "",
      "The catalog folder is --catalog DIR, else $MORPHSCOUT_CATALOG, else ./morphscout-catalog. Start with "
          + "'morphscout demo', or 'morphscout index <folder>' on your own pictures.",
    },
    synopsisSubcommandLabel = "<command>",
    subcommands = {
      CommandLine.HelpCommand.class,
      DemoCommand.class,
      IndexCommand.class,
      ImportCommand.class,
      StatusCommand.class,
      SimilarCommand.class,
      PairsCommand.class,
      ScreenCommand.class,
      DecideCommand.class,
      DecisionsCommand.class,
      ChainCommand.class,
      WalkCommand.class,
      PreviewCommand.class,
      ModelsCommand.class,
      BrowseCommand.class,
      BenchCommand.class,
    })
public final class MorphscoutCommand implements Callable<Integer> {

  @Spec CommandSpec spec;

  @Option(names = "--catalog", paramLabel = "<dir>", scope = ScopeType.INHERIT,
      description = "Catalog folder (default: $MORPHSCOUT_CATALOG, else ./morphscout-catalog).")
  Path catalog;

  @Option(names = {"-v", "--verbose"}, scope = ScopeType.INHERIT,
      description = "Show diagnostics on stderr (-v: progress details; -vv or --debug: everything).")
  boolean[] verbose = new boolean[0];

  @Option(names = "--debug", scope = ScopeType.INHERIT, hidden = true)
  boolean debug;

  /** The catalog folder chosen by the options and environment. */
  Path catalogDir() {
    return CatalogLocation.resolve(catalog, System.getenv());
  }

  @Override
  public Integer call() {
    spec.commandLine().usage(spec.commandLine().getOut());
    return ExitCodes.USAGE;
  }

  /** Every command's --help lists the same exit codes. */
  private static void listExitCodes(CommandLine cl) {
    java.util.Map<String, String> codes = new java.util.LinkedHashMap<>();
    for (String line : ExitCodes.HELP) {
      int colon = line.indexOf(':');
      codes.put(line.substring(0, colon), line.substring(colon + 1));
    }
    cl.getCommandSpec().usageMessage().exitCodeListHeading("%nExit codes:%n").exitCodeList(codes);
    for (CommandLine sub : cl.getSubcommands().values()) {
      listExitCodes(sub);
    }
  }

  /** A configured command line writing to the given streams. */
  public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
    CommandLine cl = new CommandLine(new MorphscoutCommand());
    cl.setOut(out);
    cl.setErr(err);
    cl.setExecutionExceptionHandler(new ErrorHandler());
    cl.setParameterExceptionHandler(new UsageErrorHandler());
    cl.setCaseInsensitiveEnumValuesAllowed(true);
    cl.setUsageHelpLongOptionsMaxWidth(30);
    cl.setUsageHelpAutoWidth(true);
    listExitCodes(cl);
    ScoreOptions.listSettings(cl.getSubcommands().get("pairs"));
    return cl;
  }
}
