package org.morphscout.app.cli;

import picocli.CommandLine.IVersionProvider;

/** Reports the build's version from the jar manifest. */
final class VersionProvider implements IVersionProvider {
  @Override
  public String[] getVersion() {
    String v = VersionProvider.class.getPackage().getImplementationVersion();
    return new String[] {"morphscout " + (v == null ? "development build" : v),
        "Java " + Runtime.version() + " (" + System.getProperty("java.vendor") + ")"};
  }
}
