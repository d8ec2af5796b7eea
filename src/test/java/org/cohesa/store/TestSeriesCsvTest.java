package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.TestResult;
import org.junit.jupiter.api.Test;

class TestSeriesCsvTest {

    private static SolventLibrary library() throws Exception {
        BundledData b = BundledData.resource("solvents.csv");
        return new SolventLibrary(SolventCsv.read(b.name(), new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false));
    }

    @Test
    void readsSolventsBlendsAndExplicitParameters() throws Exception {
        String csv = "liquid,score,dD,dP,dH,temperature_c\n"
                + "toluene,1,,,,25\n"
                + "\"1,4-dioxane:0.3;water:0.7\",0.5,,,,\n"
                + "house thinner,0,16.0,4.0,9.0,\n";
        List<TestResult> r = TestSeriesCsv.read("t.csv", new StringReader(csv), library());
        assertEquals(3, r.size());
        assertEquals(25.0, r.get(0).temperatureC());
        // volume-fraction rule (Hansen 2007, ch. 1) with the library's 1,4-dioxane and water parameters
        SolventLibrary lib = library();
        double dD = 0.3 * lib.resolve("t", "1,4-dioxane").hansen().dD() + 0.7 * lib.resolve("t", "water").hansen().dD();
        assertEquals(dD, r.get(1).liquid().dD(), 1e-9);
        assertEquals(0.5, r.get(1).score());
        assertEquals(9.0, r.get(2).liquid().dH());
    }

    @Test
    void everyBadCellIsListedAndNothingIsReturned() throws Exception {
        String csv = "liquid,score,dD,dP,dH\n"
                + "toluene,1,,,\n"
                + "unobtainol,1,,,\n"
                + "ethanol,maybe,,,\n"
                + "acetone,1.4,,,\n"
                + "x,0,16,4,\n"
                + "\"toluene:0.5;ethanol:0.6\",1,,,\n";
        BadRowsException e = assertThrows(BadRowsException.class, () -> TestSeriesCsv.read("t.csv", new StringReader(csv), library()));
        List<String> where = e.errors().stream().map(x -> x.line() + ":" + x.column()).toList();
        assertEquals(List.of("3:liquid", "4:score", "5:score", "6:dD/dP/dH", "7:liquid"), where);
        assertEquals("unobtainol", e.errors().get(0).value());
    }

    @Test
    void headerWithoutScoreIsRefused() throws Exception {
        BadRowsException e = assertThrows(BadRowsException.class,
                () -> TestSeriesCsv.read("t.csv", new StringReader("liquid,outcome\ntoluene,1\n"), library()));
        assertEquals(List.of("outcome", "score"), e.errors().stream().map(x -> x.column()).toList());
        assertEquals("the header has no result column: name it score, result or soluble", e.errors().get(1).reason());
    }

    @Test
    void headersAsLabsTypeThemInAnyCaseWithSemicolonsOrTabsAndABom() throws Exception {
        SolventLibrary lib = library();
        List<TestResult> semi = TestSeriesCsv.read("t.csv", new StringReader("\uFEFFSolvent;Result\ntoluene;yes\nethanol;No\nacetone;partial\n"
                + "\"1,4-dioxane\";0,5\n"), lib);
        assertEquals(List.of(1.0, 0.0, 0.5, 0.5), semi.stream().map(TestResult::score).toList());
        assertEquals("toluene", semi.get(0).label());
        List<TestResult> tab = TestSeriesCsv.read("t.tsv", new StringReader("NAME\tSOLUBLE\ntoluene\t+\nwater\t-\nacetone\t±\nethanol\t−\n"), lib);
        assertEquals(List.of(1.0, 0.0, 0.5, 0.0), tab.stream().map(TestResult::score).toList());
        // by CAS number alone: 108-88-3 is toluene (CAS Registry; the bundled table's cas column)
        List<TestResult> cas = TestSeriesCsv.read("t.csv", new StringReader("CAS,score\n108-88-3,1\n64-17-5,0\n67-64-1,1\n"), lib);
        assertEquals(lib.resolve("t", "toluene").hansen(), cas.get(0).liquid());
        List<TestResult> words = TestSeriesCsv.read("t.csv", new StringReader("liquid,score\ntoluene,Y\nwater,n\nacetone,+/-\nxylene,1\n"), lib);
        assertEquals(List.of(1.0, 0.0, 0.5, 1.0), words.stream().map(TestResult::score).toList());
    }

    @Test
    void anUnreadableResultOrColumnIsOneLineNamingTheColumn() throws Exception {
        SolventLibrary lib = library();
        BadRowsException e = assertThrows(BadRowsException.class,
                () -> TestSeriesCsv.read("t.csv", new StringReader("solvent;result\ntoluene;maybe\n"), lib));
        assertEquals(1, e.errors().size());
        assertEquals("line 2, column result, value 'maybe': not a result: write 1, 0 or a graded number between, yes/no/partial, or +/-/±",
                e.errors().get(0).describe());
        BadRowsException u = assertThrows(BadRowsException.class,
                () -> TestSeriesCsv.read("t.csv", new StringReader("liquid,score,colour\ntoluene,1,red\n"), lib));
        assertEquals("colour", u.errors().get(0).column());
        BadRowsException twice = assertThrows(BadRowsException.class,
                () -> TestSeriesCsv.read("t.csv", new StringReader("liquid,solvent,score\ntoluene,toluene,1\n"), lib));
        assertEquals("a second liquid column (the first is 'liquid'); keep one", twice.errors().get(0).reason());
        // a comma-separated file with an unquoted 1,4-dioxane: the row is too long, and the message says to quote it
        BadRowsException comma = assertThrows(BadRowsException.class,
                () -> TestSeriesCsv.read("t.csv", new StringReader("liquid,score\n1,4-dioxane,1\n"), lib));
        assertTrue(comma.errors().get(0).reason().contains("quote names that hold a comma"), comma.errors().get(0).reason());
    }
}
