package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The layering of the cli module (shared/ARCHITECTURE.md): no picocli below the command line, and no import cycle
 * among the module's packages. A scan of the sources' import lines and fully qualified names (common practice, no
 * source).
 */
class ArchitectureTest {
    private static final Path SOURCES = Path.of("src/main/java");
    private static final Pattern REFERENCE = Pattern.compile("\\b(org\\.qchain\\.[a-z]+(?:\\.[a-z]+)*)\\.[A-Z]");

    /** Our packages of the cli module, each with the packages of this module its sources name. */
    private static Map<String, Set<String>> dependencies() throws IOException {
        Map<String, Set<String>> deps = new TreeMap<>();
        List<Path> files;
        try (Stream<Path> s = Files.walk(SOURCES)) {
            files = s.filter(p -> p.toString().endsWith(".java")).toList();
        }
        for (Path f : files) {
            String pkg = SOURCES.relativize(f.getParent()).toString().replace('/', '.');
            Set<String> out = deps.computeIfAbsent(pkg, k -> new TreeSet<>());
            Matcher m = REFERENCE.matcher(Files.readString(f, StandardCharsets.UTF_8));
            while (m.find()) {
                String target = m.group(1);
                if (!target.equals(pkg) && Files.isDirectory(SOURCES.resolve(target.replace('.', '/')))) {
                    out.add(target);
                }
            }
        }
        return deps;
    }

    @Test
    void theScanSeesTheLayers() throws IOException {
        // guards the scan: the command line must be seen depending on the analysis layer
        Map<String, Set<String>> deps = dependencies();
        assertTrue(deps.get("org.qchain.cli").contains("org.qchain.analysis"), deps::toString);
        assertTrue(deps.get("org.qchain.format").contains("org.qchain.result"), deps::toString);
    }

    @Test
    void noPicocliBelowTheCommandLine() throws IOException {
        for (String layer : List.of("analysis", "result", "format")) {
            try (Stream<Path> s = Files.walk(SOURCES.resolve("org/qchain/" + layer))) {
                for (Path f : s.filter(p -> p.toString().endsWith(".java")).toList()) {
                    String text = Files.readString(f, StandardCharsets.UTF_8);
                    assertTrue(!text.contains("picocli."), () -> f + " names a picocli class");
                }
            }
        }
    }

    @Test
    void resultsAndFormattersNameNoEngine() throws IOException {
        Map<String, Set<String>> deps = dependencies();
        assertEquals(Set.of(), deps.get("org.qchain.result"), "result depends on nothing of this module");
        assertEquals(Set.of("org.qchain.result"), deps.get("org.qchain.format"));
        assertEquals(Set.of("org.qchain.result"), deps.get("org.qchain.analysis"));
    }

    @Test
    void noImportCycleAmongThePackages() throws IOException {
        Map<String, Set<String>> deps = dependencies();
        for (String start : deps.keySet()) {
            // depth-first search for a path back to start
            List<String> todo = new ArrayList<>(deps.get(start));
            Set<String> seen = new TreeSet<>();
            while (!todo.isEmpty()) {
                String p = todo.remove(todo.size() - 1);
                assertTrue(!p.equals(start), () -> "import cycle through " + start + ": " + deps);
                if (seen.add(p)) {
                    todo.addAll(deps.getOrDefault(p, Set.of()));
                }
            }
        }
    }
}
