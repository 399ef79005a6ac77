package org.spanlift.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.Properties;

import picocli.CommandLine.IVersionProvider;

/**
 * What {@code spanlift --version} prints: the version and the commit the program was built from (both written
 * into {@code build.properties} by the build), and the Java runtime it runs on. A value the build did not fill in
 * (classes compiled outside Maven) reads "unknown".
 */
public final class VersionProvider implements IVersionProvider {

    /** The resource the build fills in, beside this class. */
    static final String RESOURCE = "build.properties";
    static final String UNKNOWN = "unknown";

    @Override
    public String[] getVersion() {
        Properties build = read();
        return new String[] {
            "spanlift " + value(build, "version"),
            "commit " + value(build, "commit"),
            "java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ") on "
                    + System.getProperty("os.name") + " " + System.getProperty("os.arch"),
        };
    }

    /** The program's version as the build recorded it, or "unknown". */
    public static String version() {
        return value(read(), "version");
    }

    /** The commit the program was built from (abbreviated, "-dirty" if the sources differed), or "unknown". */
    public static String commit() {
        return value(read(), "commit");
    }

    private static String value(Properties build, String key) {
        String v = build.getProperty(key, "").strip();
        return v.isEmpty() || v.contains("${") ? UNKNOWN : v;
    }

    private static Properties read() {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream(RESOURCE)) {
            if (in != null) {
                try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
                    p.load(r);
                }
            }
        } catch (IOException e) {
            // an unreadable resource inside the program's own jar: report the values as unknown
        }
        return p;
    }
}
