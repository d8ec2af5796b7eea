package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
        assertEquals(List.of("method", "dD", "dP", "dH", "r0", "good_inside", "good_total", "bad_outside", "bad_total", "misfits",
                "likely_misfits", "results", "confidence", "region", "next_tests", "notes"), fields);
        assertEquals("likelihood", j.get("method").asText());
        // the demo file holds one invented slip (chloroform scored 0 although the other results put it inside)
        assertEquals("chloroform", j.get("misfits").get(0).get("name").asText());
        assertTrue(j.get("misfits").get(0).get("red").asDouble() < 1);
        assertEquals(2, j.get("confidence").get("dD").size());
        assertTrue(j.get("next_tests").size() > 0);
    }

    @Test
    void likelihoodFitGivesEveryResultItsProbabilityAndTheRegionItsSize() throws Exception {
        Run r = run("fit", demo().toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode results = j.get("results");
        assertEquals(32, results.size());
        // least likely first; chloroform, the invented slip at RED about 0.8, is the least likely result
        assertEquals("chloroform", results.get(0).get("name").asText());
        for (int i = 1; i < results.size(); i++) {
            assertTrue(results.get(i).get("probability").asDouble() >= results.get(i - 1).get("probability").asDouble());
        }
        JsonNode region = j.get("region");
        assertTrue(region.get("centre_radius").asDouble() > 0);
        assertEquals(9.488, region.get("deviance_limit").asDouble(), 1e-3, "χ²₄ 95 % quantile (statistical tables)");
        assertTrue(region.get("samples").size() > 10);
        assertTrue(region.get("bounded").isBoolean());
        assertTrue(j.get("next_tests").get(0).get("expected_shrinkage").asDouble() > 0);
    }

    @Test
    void classicMethodIsTheBaselineWithABootstrapBox() throws Exception {
        Run r = run("fit", demo().toString(), "--json", "--method", "classic", "--resamples", "20");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("classic", j.get("method").asText());
        assertTrue(j.get("region") == null && j.get("results") == null);
        assertEquals(20, j.get("confidence").get("resamples").asInt());
        assertEquals(2, run("fit", demo().toString(), "--method", "best").code());
    }

    @Test
    void nextTestsLeaveOutCarcinogensAndReprotoxicantsUnlessAllowed() throws Exception {
        // safety first, as in blend (H340/H350/H360 and ICH Q3C class 1; the classifications are the library's):
        // for the demo series the most informative liquids include 2-nitropropane and nitrobenzene
        java.util.function.Function<Run, java.util.List<String>> names = r -> {
            try {
                java.util.List<String> out = new java.util.ArrayList<>();
                new ObjectMapper().readTree(r.out()).get("next_tests").forEach(n -> out.add(n.get("name").asText()));
                return out;
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        };
        java.util.List<String> safe = names.apply(run("fit", demo().toString(), "--json"));
        assertFalse(safe.isEmpty());
        assertFalse(safe.contains("2-nitropropane") || safe.contains("nitrobenzene"), safe.toString());
        java.util.List<String> all = names.apply(run("fit", demo().toString(), "--json", "--allow-cmr"));
        assertTrue(all.contains("2-nitropropane") || all.contains("nitrobenzene"), all.toString());
    }

    @Test
    void priorFromARelatedMaterialIsNamedInTheOutput() throws Exception {
        Run r = run("fit", demo().toString(), "--json", "--prior", "PMMA", "--prior-spread", "2");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertTrue(j.get("prior").get("source").asText().contains("poly(methyl methacrylate)"), j.get("prior").toString());
        assertTrue(j.get("region").get("with_prior").asBoolean());
        Run text = run("fit", demo().toString(), "--prior", "PMMA");
        assertTrue(text.out().contains("note: prior: the centre was pulled towards 18.6/10.5/7.5"), text.out());
        Run wrong = run("fit", demo().toString(), "--prior", "PMMA", "--method", "classic");
        assertEquals(2, wrong.code());
        assertTrue(wrong.err().startsWith("error: --prior 'PMMA'"), wrong.err());
    }

    @Test
    void priorFromTheStructureIsNamedInTheOutput() throws Exception {
        // aspirin, PubChem CID 2244 (SMILES from memory); the estimate and its errors come from the default group route (mean of Mathieu 2018 and Stefanis–Panayiotou)
        Run r = run("fit", demo().toString(), "--json", "--prior-smiles", "CC(=O)Oc1ccccc1C(=O)O");
        assertEquals(0, r.code(), r.err());
        JsonNode p = new ObjectMapper().readTree(r.out()).get("prior");
        assertEquals("structure estimate", p.get("kind").asText());
        assertTrue(p.get("source").asText().startsWith("estimated from the structure"), p.toString());
        assertTrue(p.get("sd_dP").asDouble() > p.get("sd_dD").asDouble(), "δP is estimated less well than δD: " + p);
        Run text = run("fit", demo().toString(), "--prior-smiles", "CC(=O)Oc1ccccc1C(=O)O");
        assertTrue(text.out().contains("note: prior: the centre was pulled towards") && text.out().contains("estimated from the structure"), text.out());
        Run both = run("fit", demo().toString(), "--prior", "PMMA", "--prior-smiles", "CCO");
        assertEquals(2, both.code());
        assertTrue(both.err().startsWith("error: --prior-smiles 'CCO'"), both.err());
        Run bad = run("fit", demo().toString(), "--prior-smiles", "C1CC(");
        assertEquals(2, bad.code());
        assertTrue(bad.err().startsWith("error: --prior-smiles"), bad.err());
        // a material added by its structure brings that estimate, with the same spreads, as --prior
        Run added = run("materials", "add", "--name", "DS-3 test", "--smiles", "CC(=O)Oc1ccccc1C(=O)O");
        assertEquals(0, added.code(), added.err());
        JsonNode viaMaterial = new ObjectMapper().readTree(run("fit", demo().toString(), "--json", "--prior", "DS-3 test").out()).get("prior");
        assertEquals("structure estimate", viaMaterial.get("kind").asText(), viaMaterial.toString());
        assertEquals(p.get("sd_dP").asDouble(), viaMaterial.get("sd_dP").asDouble(), 1e-9);
        Run lonely = run("fit", demo().toString(), "--prior-spread", "2");
        assertEquals(2, lonely.code());
        assertTrue(lonely.err().startsWith("error: --prior-spread"), lonely.err());
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
    void aLabsSemicolonFileWithABomFitsAndAnUnknownResultIsOneLine() throws Exception {
        Path f = dir.resolve("lab.csv");
        StringBuilder b = new StringBuilder("\uFEFFSolvent;Result\n");
        for (String good : List.of("acetone", "methyl ethyl ketone", "ethyl acetate", "tetrahydrofuran", "dichloromethane", "cyclohexanone")) {
            b.append(good).append(";yes\n");
        }
        for (String bad : List.of("n-hexane", "methanol", "water", "ethanol", "cyclohexane", "ethylene glycol")) {
            b.append(bad).append(";no\n");
        }
        b.append("toluene;partial\n");
        Files.writeString(f, b.toString());
        Run ok = run("fit", f.toString(), "--json");
        assertEquals(0, ok.code(), ok.err());
        assertEquals(13, new ObjectMapper().readTree(ok.out()).get("results").size());
        Files.writeString(f, b + "xylene;maybe\n");
        Run bad = run("fit", f.toString());
        assertEquals(2, bad.code());
        // the summary line of every bad file, then one line for the one bad cell, naming its column
        assertTrue(bad.err().startsWith("error: " + f + ": 1 bad cell"), bad.err());
        assertEquals(1, bad.err().lines().filter(l -> l.strip().startsWith("line ")).count(), bad.err());
        assertTrue(bad.err().contains("line 15, column Result, value 'maybe': not a result"), bad.err());
    }

    @Test
    void saveWithoutNameIsRefused() {
        Run r = run("fit", demo().toString(), "--save");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: --save"), r.err());
    }
}
