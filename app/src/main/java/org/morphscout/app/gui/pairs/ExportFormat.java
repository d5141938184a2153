package org.morphscout.app.gui.pairs;

/** File formats for exported approved pairs. */
public enum ExportFormat {
  CSV("csv"),
  JSON("json");

  private final String extension;

  ExportFormat(String extension) {
    this.extension = extension;
  }

  public String extension() {
    return extension;
  }

  /** The format a file name asks for (by extension, case-insensitive); CSV when unclear. */
  public static ExportFormat forFile(String name) {
    return name.toLowerCase(java.util.Locale.ROOT).endsWith(".json") ? JSON : CSV;
  }
}
