package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --output}: written atomically, never over the model, a clear one-line error when it cannot be written. The
 * rules are the project's (common practice, no source).
 */
class OutputFileTest {
    private static final String MODEL = Cli.model("plant.chain");

    @TempDir
    Path dir;

    @Test
    void outputFileHoldsExactlyWhatStdoutWouldShow() throws IOException {
        Path out = dir.resolve("p3.json");
        Cli.Result toFile = Cli.run("step", MODEL, "-n", "3", "--format", "json", "--output", out.toString());
        assertEquals(0, toFile.code(), toFile::toString);
        assertEquals("", toFile.out());
        assertEquals("", toFile.err());
        assertEquals(Cli.run("step", MODEL, "-n", "3", "--format", "json").out(),
            Files.readString(out, StandardCharsets.UTF_8));
    }

    @Test
    void existingFileIsReplacedKeepingItsPermissionsAndNoTemporaryFileRemains() throws IOException {
        Path out = dir.resolve("result.txt");
        Files.writeString(out, "old content that is longer than nothing\n");
        Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("rw-rw----"));
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "-o", out.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals(Cli.run("step", MODEL, "-n", "2").out(), Files.readString(out));
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(out)));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "only the output file is left in the directory");
        }
    }

    @Test
    void newFileIsReadableByOthers() throws IOException {
        Path out = dir.resolve("new.csv");
        assertEquals(0, Cli.run("step", MODEL, "-n", "1", "--format", "csv", "-o", out.toString()).code());
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(out)));
    }

    @Test
    void outputOverTheModelIsRefusedAndTheModelIsUntouched() throws IOException {
        Path model = dir.resolve("m.chain");
        Files.copy(Path.of(MODEL), model);
        byte[] before = Files.readAllBytes(model);
        Cli.Result r = Cli.run("step", model.toString(), "-n", "2", "--output", model.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --output '" + model + "': it is the input model; choose another file\n",
            r.err());
        assertEquals("", r.out());
        assertEquals(new String(before, StandardCharsets.UTF_8), Files.readString(model));
    }

    @Test
    void outputOverTheModelIsRefusedUnderAnotherSpelling() throws IOException {
        Path model = dir.resolve("m.chain");
        Files.copy(Path.of(MODEL), model);
        Path other = dir.resolve("sub/../m.chain");
        Files.createDirectory(dir.resolve("sub"));
        Cli.Result r = Cli.run("step", model.toString(), "-n", "2", "--output", other.toString());
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().endsWith(": it is the input model; choose another file\n"), r::toString);
    }

    @Test
    void outputThroughALinkToTheModelIsRefused() throws IOException {
        Path model = dir.resolve("m.chain");
        Files.copy(Path.of(MODEL), model);
        Path link = Files.createSymbolicLink(dir.resolve("link.chain"), model);
        Cli.Result r = Cli.run("step", model.toString(), "-n", "2", "--output", link.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --output '" + link + "': it is the input model; choose another file\n",
            r.err());
    }

    @Test
    void missingDirectoryIsAOneLineInputError() {
        Path out = dir.resolve("no/such/dir/out.txt");
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "--output", out.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --output '" + out + "': no such directory\n", r.err());
    }

    @Test
    void directoryAsOutputIsRefused() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "--output", dir.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --output '" + dir + "': it is a directory\n", r.err());
    }

    @Test
    void aNamedPipeIsWrittenIntoNotReplaced() throws Exception {
        Path fifo = dir.resolve("results.fifo");
        Process mk = new ProcessBuilder("mkfifo", fifo.toString()).inheritIO().start();
        assertEquals(0, mk.waitFor());
        java.util.concurrent.CompletableFuture<String> reader = java.util.concurrent.CompletableFuture.supplyAsync(() -> {
            try {
                return Files.readString(fifo);
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "-o", fifo.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals(Cli.run("step", MODEL, "-n", "2").out(), reader.get(30, java.util.concurrent.TimeUnit.SECONDS));
        assertTrue(Files.exists(fifo) && !Files.isRegularFile(fifo), "the pipe is still a pipe");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file is left");
        }
    }

    @Test
    void aDeviceFileIsWrittenIntoNotReplaced() {
        Path devNull = Path.of("/dev/null");
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "-o", devNull.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.out());
        assertTrue(Files.exists(devNull) && !Files.isRegularFile(devNull), "/dev/null is still a device");
    }

    @Test
    void aSymbolicLinkKeepsPointingAtTheReplacedFile() throws IOException {
        Path real = dir.resolve("real.txt");
        Files.writeString(real, "old\n");
        Path link = dir.resolve("link.txt");
        Files.createSymbolicLink(link, real);
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "-o", link.toString());
        assertEquals(0, r.code(), r::toString);
        assertTrue(Files.isSymbolicLink(link), "the link is still a link");
        assertEquals(Cli.run("step", MODEL, "-n", "2").out(), Files.readString(real));
    }
}
