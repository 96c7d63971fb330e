package org.rcbench.cli;

import picocli.CommandLine.IVersionProvider;

/** Reports the version from the jar manifest, or "development" when run from classes. */
public final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return new String[] {"rcbench " + (v == null ? "development" : v)};
    }
}
