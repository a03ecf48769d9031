package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The exact module must not depend on the symbolic or cli modules (project architecture rule). */
class DependencyRuleTest {

    private static final Pattern FORBIDDEN = Pattern.compile("\\borg\\.qchain\\.(symbolic|cli)\\b");

    // common practice, no source: a dependency check by scanning sources (the module's pom also has no such dependency)
    @Test
    void exactImportsNeitherSymbolicNorCli() throws IOException {
        Path src = Path.of("src/main/java/org/qchain/exact");
        assertTrue(Files.isDirectory(src), "run from the exact module directory");
        List<Path> files;
        try (Stream<Path> s = Files.walk(src)) {
            files = s.filter(f -> f.toString().endsWith(".java")).collect(Collectors.toList());
        }
        assertTrue(files.size() > 10, "found the sources");
        for (Path f : files) {
            String text = Files.readString(f);
            assertTrue(!FORBIDDEN.matcher(text).find(), f + " refers to org.qchain.symbolic or org.qchain.cli");
        }
    }

    // common practice, no source: the same rule on the compiled classes (constant-pool strings name every class used)
    @Test
    void compiledClassesReferToNeitherModule() throws IOException {
        Path classes = Path.of("target/classes/org/qchain/exact");
        assertTrue(Files.isDirectory(classes));
        try (Stream<Path> s = Files.walk(classes)) {
            for (Path f : s.filter(x -> x.toString().endsWith(".class")).collect(Collectors.toList())) {
                String text = new String(Files.readAllBytes(f), java.nio.charset.StandardCharsets.ISO_8859_1);
                assertTrue(!text.contains("org/qchain/symbolic") && !text.contains("org/qchain/cli"), f.toString());
            }
        }
    }
}
