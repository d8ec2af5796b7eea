package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

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
                () -> TestSeriesCsv.read("t.csv", new StringReader("liquid,result\ntoluene,1\n"), library()));
        assertEquals("score", e.errors().get(0).column());
    }
}
