package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FitCommandTest {

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> all = new ArrayList<>(List.of("--db", dir.resolve("t.db").toString()));
        all.addAll(List.of(args));
        int code = CohesaCommand.run(all.toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    private static Path demo() {
        return Path.of("demo-blends", "resin-k17-tests.csv");
    }

    @Test
    void jsonHasExactlyTheDocumentedFields() throws Exception {
        Run r = run("fit", demo().toString(), "--json", "--resamples", "50");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        List<String> fields = new ArrayList<>();
        for (Iterator<String> it = j.fieldNames(); it.hasNext(); ) {
            fields.add(it.next());
        }
        assertEquals(List.of("dD", "dP", "dH", "r0", "good_inside", "good_total", "bad_outside", "bad_total", "misfits",
                "confidence", "next_tests"), fields);
        // the demo file holds one invented slip (chloroform scored 0 although the other results put it inside)
        assertEquals("chloroform", j.get("misfits").get(0).get("name").asText());
        assertTrue(j.get("misfits").get(0).get("red").asDouble() < 1);
        assertEquals(2, j.get("confidence").get("dD").size());
        assertTrue(j.get("next_tests").size() > 0);
    }

    @Test
    void sameSeedSameOutput() {
        String a = run("fit", demo().toString(), "--json", "--seed", "4", "--resamples", "30").out();
        String b = run("fit", demo().toString(), "--json", "--seed", "4", "--resamples", "30").out();
        assertEquals(a, b);
    }

    @Test
    void saveStoresTheSphereAsTheUsersMaterial() throws Exception {
        Run r = run("fit", demo().toString(), "--name", "resin K-17", "--save", "--kind", "resin", "--resamples", "20");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("saved as your material"));
        JsonNode m = new ObjectMapper().readTree(run("material", "resin K-17", "--json").out());
        assertTrue(m.get("user_entry").asBoolean());
        assertTrue(m.get("source").asText().contains("resin-k17-tests.csv"));
    }

    @Test
    void badFileListsEveryBadRowAndExits2() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, "liquid,score\ntoluene,1\nunobtainol,1\nethanol,2\n");
        Run r = run("fit", f.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: " + f + ": 2 bad cells"), r.err());
        assertTrue(r.err().contains("line 3, column liquid, value 'unobtainol'"), r.err());
        assertTrue(r.err().contains("line 4, column score, value '2'"), r.err());
    }

    @Test
    void saveWithoutNameIsRefused() {
        Run r = run("fit", demo().toString(), "--save");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: --save"), r.err());
    }
}
