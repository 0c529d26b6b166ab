package org.flexmargin.cli;

import picocli.CommandLine.IVersionProvider;

/** Version of the tool, from the jar manifest when packaged. */
public final class Version implements IVersionProvider {
  /** @return the version string */
  public static String get() {
    String v = Version.class.getPackage().getImplementationVersion();
    return v == null ? "0.1.0-dev" : v;
  }

  @Override
  public String[] getVersion() {
    return new String[] {"flexmargin " + get()};
  }
}
