package org.spanlift.cli.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

/**
 * The release archive's THIRD-PARTY.md and NOTICE against what the jar ships. The build admits on the runtime class
 * path only the artifacts and versions listed in {@code vlm-cli/pom.xml} (the enforcer's reviewed list), so each of
 * them must have its row, and each notice such a jar carries must be in NOTICE.
 */
class ThirdPartyTest {

    private static final Path DIST = Path.of("src", "dist");

    /** {@code group:artifact} and version of each reviewed runtime dependency (not Spanlift's own, not tests'). */
    private record Artifact(String group, String artifact, String version) {
        String jarName() {
            return artifact + "-" + version + ".jar";
        }
    }

    private static List<Artifact> reviewed() throws IOException {
        String pom = Files.readString(Path.of("pom.xml"), StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("<include>([^:<]+):([^:<]+):\\[([^\\]]+)\\]</include>").matcher(pom);
        List<Artifact> list = new ArrayList<>();
        while (m.find()) {
            list.add(new Artifact(m.group(1), m.group(2), m.group(3)));
        }
        assertTrue(list.size() >= 10, "the reviewed list in vlm-cli/pom.xml was not found: " + list);
        return list;
    }

    @Test
    void everyShippedDependencyHasItsRowWithVersionAndLicence() throws IOException {
        String table = Files.readString(DIST.resolve("THIRD-PARTY.md"), StandardCharsets.UTF_8);
        String developers = Files.readString(Path.of("..", "DEVELOPERS.md"), StandardCharsets.UTF_8);
        for (Artifact a : reviewed()) {
            String row = "| `" + a.group() + ":" + a.artifact() + "` | " + a.version() + " | Apache-2.0 |";
            assertTrue(table.contains(row), "THIRD-PARTY.md lacks " + row);
            assertTrue(developers.contains(a.version()), "DEVELOPERS.md's list lacks version " + a.version());
        }
        long rows = table.lines().filter(l -> l.startsWith("| `")).count();
        assertEquals(reviewed().size(), rows, "THIRD-PARTY.md lists something the jar does not ship");
    }

    @Test
    void everyNoticeAShippedJarCarriesIsInNotice() throws IOException {
        String notice = normalized(Files.readString(DIST.resolve("NOTICE"), StandardCharsets.UTF_8));
        List<String> found = new ArrayList<>();
        for (String name : List.of("META-INF/NOTICE", "META-INF/NOTICE.txt")) {
            for (URL url : Collections.list(ClassLoader.getSystemClassLoader().getResources(name))) {
                for (Artifact a : reviewed()) {
                    if (url.toString().endsWith("/" + a.jarName() + "!/" + name)) {
                        String text;
                        try (InputStream in = url.openStream()) {
                            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                        }
                        assertTrue(notice.contains(normalized(text)), "NOTICE lacks the notice of " + a.jarName());
                        found.add(a.artifact());
                    }
                }
            }
        }
        // Batik's parts, xmlgraphics-commons, commons-io and commons-logging carry one (checked when this was written)
        assertTrue(found.containsAll(List.of("batik-svggen", "xmlgraphics-commons", "commons-io", "commons-logging")),
                "the jars' notices were not found on the class path: " + found);
        assertFalse(found.isEmpty());
    }

    /** Lines stripped of surrounding blanks, blank lines dropped, joined by one line feed. */
    private static String normalized(String text) {
        return text.lines().map(String::strip).filter(l -> !l.isEmpty()).collect(Collectors.joining("\n"));
    }
}
