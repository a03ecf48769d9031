package org.qchain.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The version written into {@code version.properties} by the build. */
final class VersionProvider implements IVersionProvider {

    @Override
    public String[] getVersion() throws IOException {
        return new String[] {"qchain " + version()};
    }

    /** The project version, or {@code unknown} when run from classes that were not built by Maven. */
    static String version() throws IOException {
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        }
    }
}
