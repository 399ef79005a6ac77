package org.spanlift.cli;

import picocli.CommandLine.IVersionProvider;

/** The version from the jar manifest (Implementation-Version), or "development" when run from classes. */
public final class VersionProvider implements IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = SpanliftCommand.class.getPackage().getImplementationVersion();
        return new String[] {"spanlift " + (v == null ? "development build" : v)};
    }
}
