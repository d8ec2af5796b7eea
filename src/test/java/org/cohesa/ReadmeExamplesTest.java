package org.cohesa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.cohesa.cli.CohesaCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every {@code java -jar target/cohesa.jar …} line in the bash blocks of the README and of the demo walk-throughs
 * ({@code demo-blends/*.md}) runs, in order, against one
 * scratch database in a scratch folder (with a copy of demo-blends/), and must exit 0: the README cannot
 * promise a command that does not work.
 */
class ReadmeExamplesTest {

    private static final String PREFIX = "java -jar target/cohesa.jar";

    @TempDir
    Path work;

    @Test
    void everyReadmeCommandRuns() throws Exception {
        List<List<String>> commands = commands(Files.readString(Path.of("README.md"), StandardCharsets.UTF_8));
        assertTrue(commands.size() >= 4, "the README should show command-line examples");
        try (Stream<Path> demos = Files.list(Path.of("demo-blends"))) {
            for (Path demo : demos.filter(p -> p.toString().endsWith(".md")).sorted().toList()) {
                commands.addAll(commands(Files.readString(demo, StandardCharsets.UTF_8)));
            }
        }
        copyTree(Path.of("demo-blends"), work.resolve("demo-blends"));
        // one JVM for all examples, started in the scratch folder so relative output files land there
        Path script = work.resolve("examples.json");
        Files.writeString(script, new ObjectMapper().writeValueAsString(commands));
        List<String> cmd = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), Runner.class.getName(), script.toString());
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(work.toFile()).redirectErrorStream(true);
        pb.environment().put("COHESA_HOME", work.resolve("home").toString());
        Process p = pb.start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "timed out");
        assertEquals(0, p.exitValue(), "a README example failed:\n" + output);
    }

    /** Runs each example in turn in this JVM; stops at the first that does not exit 0. */
    public static final class Runner {
        public static void main(String[] args) throws Exception {
            List<List<String>> commands = new ObjectMapper().readValue(Path.of(args[0]).toFile(),
                    new TypeReference<List<List<String>>>() { });
            for (List<String> c : commands) {
                StringWriter out = new StringWriter();
                StringWriter err = new StringWriter();
                int code = CohesaCommand.run(c.toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
                if (code != 0) {
                    System.out.println("cohesa " + String.join(" ", c) + " exited " + code + "\n" + out + err);
                    System.exit(1);
                }
            }
            System.exit(0);
        }
    }

    /** The argument lists of the README's example lines (launching the app without arguments is skipped). */
    static List<List<String>> commands(String readme) {
        List<List<String>> out = new ArrayList<>();
        boolean inBash = false;
        for (String line : readme.split("\\R")) {
            String t = line.strip();
            if (t.startsWith("```")) {
                inBash = !inBash && t.startsWith("```bash");
                continue;
            }
            if (inBash && t.startsWith(PREFIX)) {
                List<String> words = shellWords(t.substring(PREFIX.length()));
                if (!words.isEmpty()) {
                    out.add(words);
                }
            }
        }
        return out;
    }

    /** Splits like a POSIX shell (quotes, backslashes), stopping at an unquoted # comment or a && / | chain. */
    static List<String> shellWords(String s) {
        List<String> words = new ArrayList<>();
        StringBuilder cur = null;
        char quote = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                } else if (c == '\\' && quote == '"' && i + 1 < s.length()) {
                    cur.append(s.charAt(++i));
                } else {
                    cur.append(c);
                }
            } else if (c == '\'' || c == '"') {
                quote = c;
                cur = cur == null ? new StringBuilder() : cur;
            } else if (Character.isWhitespace(c)) {
                if (cur != null) {
                    words.add(cur.toString());
                    cur = null;
                }
            } else if ((c == '#' && cur == null) || c == '|' || c == '>' || (c == '&' && i + 1 < s.length() && s.charAt(i + 1) == '&')) {
                break;
            } else if (c == '\\' && i + 1 < s.length()) {
                cur = cur == null ? new StringBuilder() : cur;
                cur.append(s.charAt(++i));
            } else {
                cur = cur == null ? new StringBuilder() : cur;
                cur.append(c);
            }
        }
        if (cur != null) {
            words.add(cur.toString());
        }
        return words;
    }

    private static void copyTree(Path from, Path to) throws IOException {
        if (!Files.isDirectory(from)) {
            return;
        }
        try (Stream<Path> paths = Files.walk(from)) {
            for (Path p : (Iterable<Path>) paths::iterator) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
    }
}
