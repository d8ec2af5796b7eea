package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import org.cohesa.cli.CliTestSupport.Result;
import org.cohesa.store.RegisterStores;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The record commands against a shared PostgreSQL register, as a site sets one up: the local register copied in by the
 * owner and sealed by the server's secret, then people at their own logins — four eyes and the rule switch refused in
 * one line with exit 2, verify and anchors on the server's seal. Skipped with a message without a test server
 * ({@link RegisterStores}).
 */
class SharedRegisterCommandsTest {

    @TempDir
    Path dir;
    Path db;
    RegisterStores.Store store;

    @BeforeEach
    void server() {
        String why = RegisterStores.postgresUnavailable();
        assumeTrue(why == null, why);
        store = RegisterStores.postgres();
        db = dir.resolve("cohesa.db");
    }

    @AfterEach
    void close() {
        if (store != null) {
            store.close();
        }
    }

    private Result run(String... args) {
        return CliTestSupport.run(db, args);
    }

    private static Result file(Path db, String register, String author) {
        return CliTestSupport.run(db, "record", "add", "--process", "Enamel thinner, line 2 (invented demo)", "--replaced", "toluene",
                "--replacement", "ethyl acetate:0.5,n-butyl acetate:0.5", "--reason", "regulatory: reprotoxic aromatic", "--author", author,
                "--target", "18,9,8,7", "--register", register);
    }

    private static void oneLine(Result r, String... parts) {
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        for (String p : parts) {
            assertTrue(r.err().contains(p), r.err());
        }
    }

    @Test
    void aSiteMovesItsRegisterToTheServerAndWorksOnItByLogin() throws Exception {
        Result local = run("record", "add", "--process", "Degreasing bath (invented demo)", "--replaced", "toluene", "--replacement",
                "ethyl acetate", "--reason", "safety", "--author", "A. Chemist", "--target", "18,9,8,7");
        assertEquals(0, local.exitCode(), local.err());

        // the owner copies the local register in; the server seals the copy with its own secret
        Result copy = run("record", "copy", "--to", store.address("postgres"), "--json");
        assertEquals(0, copy.exitCode(), copy.err());
        assertTrue(copy.json().get("intact_after").asBoolean(), copy.out());
        String serverKey = copy.json().get("key_id").asText();
        assertEquals(16, serverKey.length(), copy.out());

        String alice = store.address("alice");
        String bob = store.address("bob");
        assertEquals(0, file(db, alice, "A. Author").exitCode());
        // alice cannot review her own record under another name; bob can
        oneLine(run("record", "review", "2", "--by", "B. Reviewer", "--register", alice), "four-eyes rule", "filed record 2", "login (alice)");
        assertEquals(0, run("record", "review", "2", "--by", "B. Reviewer", "--register", bob).exitCode());
        oneLine(run("record", "approve", "2", "--by", "M. Manager", "--comment", "ok", "--register", bob), "reviewed record 2", "(bob)");
        // only the owner or cohesa_register_admin switches the rule
        oneLine(run("record", "rule", "four-eyes", "off", "--by", "A. Author", "--reason", "in a hurry", "--register", alice),
                "cohesa_register_admin");
        assertEquals(0, run("record", "approve", "2", "--by", "M. Manager", "--comment", "ok", "--register", store.address("carol")).exitCode());

        Result verify = run("record", "verify", "--register", bob, "--json");
        assertEquals(0, verify.exitCode(), verify.out());
        assertTrue(verify.json().get("key_checked").asBoolean(), verify.out());
        assertEquals(serverKey, verify.json().get("key_id").asText(), "checked with the server's secret, no key file");
        assertEquals(4, verify.json().get("sealed_events").asInt(), "copied 1, filed 1, reviewed, approved: " + verify.out());
        assertTrue(run("record", "verify", "--register", bob).out().contains("secret held by the server, key " + serverKey));

        Path anchor = dir.resolve("anchor.json");
        Result a = run("record", "anchor", anchor.toString(), "--register", bob, "--json");
        assertEquals(0, a.exitCode(), a.err());
        assertEquals(64, a.json().get("mac").asText().length(), "sealed by the server");
        assertEquals(0, file(db, alice, "A. Author").exitCode());
        Result later = run("record", "verify", "--anchor", anchor.toString(), "--register", bob, "--json");
        assertEquals(0, later.exitCode(), later.out());
        assertEquals(1, later.json().get("events_since_anchor").asInt());
        Result show = run("record", "show", "2", "--register", bob, "--json");
        assertEquals("carol", show.json().get("history").get(2).get("account").asText());
    }
}
