package org.cohesa.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Runs the command line in-process against a scratch database and captures what it prints. */
public final class CliTestSupport {

    /** What one run printed and returned. */
    public record Result(int exitCode, String out, String err) {
        public JsonNode json() {
            try {
                return new ObjectMapper().readTree(out);
            } catch (Exception e) {
                throw new AssertionError("not JSON: " + out + "\nstderr: " + err, e);
            }
        }
    }

    private CliTestSupport() {
    }

    /**
     * Runs as another operating-system account (as if another person signed in to this machine and ran the command):
     * the register records the account and the four-eyes rule compares it.
     */
    public static Result runAs(String account, Path db, String... args) {
        try (org.cohesa.store.LocalAccount.Scope ignored = org.cohesa.store.LocalAccount.actAsInThisProcess(account)) {
            return run(db, args);
        }
    }

    public static Result run(Path db, String... args) {
        List<String> all = new ArrayList<>(List.of(args));
        all.add("--db");
        all.add(db.toString());
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(all.toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
        return new Result(code, out.toString(), err.toString());
    }
}
