package org.qchain.analysis;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * A reward file: one line {@code STATE VALUE} (or {@code reward STATE VALUE}, the model file's spelling) per state
 * that earns a reward per step; {@code #} starts a comment; states not listed earn 0. Values are exact numbers
 * ({@code 12}, {@code 2.5}, {@code 3/4}).
 */
public final class RewardFile {
    private RewardFile() {
    }

    /**
     * Reads a reward file for a model.
     *
     * @param file  the file
     * @param model the model whose states the file names
     * @return the reward of each listed state
     * @throws QchainException located {@code file:line:col} for an unknown state, a bad number, a repeated state,
     *                         a line of the wrong shape, or an unreadable file
     */
    public static Map<String, Rational> read(Path file, LoadedModel model) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, file, e.getMessage() == null ? "I/O error" : e.getMessage());
        }
        Map<String, Rational> out = new LinkedHashMap<>();
        Map<String, Integer> firstLine = new LinkedHashMap<>();
        String name = file.toString();
        for (int ln = 0; ln < lines.size(); ln++) {
            String line = lines.get(ln);
            int hash = line.indexOf('#');
            String body = hash >= 0 ? line.substring(0, hash) : line;
            String[] words = body.strip().isEmpty() ? new String[0] : body.strip().split("\\s+");
            if (words.length == 0) {
                continue;
            }
            int offset = words[0].equals("reward") ? 1 : 0;
            if (words.length - offset != 2) {
                throw new QchainException(pos(name, ln, line, words[0]), ErrorKey.SYNTAX,
                    "expected STATE VALUE (for example: Worn 12.5)");
            }
            String state = words[offset];
            SourcePos at = pos(name, ln, line, state);
            if (model.model().indexOf(state).isEmpty()) {
                throw new QchainException(at, ErrorKey.UNKNOWN_STATE, state);
            }
            if (firstLine.containsKey(state)) {
                throw new QchainException(at, ErrorKey.SYNTAX, "a second reward for " + state + " (the first is on"
                    + " line " + firstLine.get(state) + ")");
            }
            String v = words[offset + 1];
            try {
                out.put(state, Rational.parse(v));
            } catch (QchainException | ArithmeticException | NumberFormatException e) {
                throw new QchainException(pos(name, ln, line, v), ErrorKey.MALFORMED_NUMBER, v);
            }
            firstLine.put(state, ln + 1);
        }
        return out;
    }

    private static SourcePos pos(String file, int line, String text, String word) {
        return new SourcePos(file, line + 1, text.indexOf(word) + 1);
    }
}
