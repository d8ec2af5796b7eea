package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Our curated UNIFAC tables against the published tables in ../shared/reference-data (Hansen et al. 1991,
 * Wittig et al. 2003, Magnussen et al. 1981; see that folder's README). Skips, saying why, when the folder is absent.
 */
class UnifacTablesTest {

    private static final List<Path> CANDIDATES = List.of(Path.of("..", "shared", "reference-data"), Path.of("/work/shared/reference-data"));

    private static Path reference() {
        for (Path p : CANDIDATES) {
            if (Files.isRegularFile(p.resolve("unifac-subgroups.tsv"))) {
                return p;
            }
        }
        Assumptions.assumeTrue(false, "reference-data folder absent: looked in " + CANDIDATES);
        return null;
    }

    @Test
    void originalSetMatchesThePublishedTables() throws IOException {
        Path ref = reference();
        checkSubgroups(UnifacParameters.original(), ref.resolve("unifac-subgroups.tsv"));
        checkInteractions(UnifacParameters.original(), ref.resolve("unifac-interaction-parameters.tsv"));
    }

    @Test
    void liquidLiquidSetMatchesThePublishedTables() throws IOException {
        Path ref = reference();
        checkSubgroups(UnifacParameters.liquidLiquid(), ref.resolve("unifac-lle-subgroups.tsv"));
        checkInteractions(UnifacParameters.liquidLiquid(), ref.resolve("unifac-lle-interaction-parameters.tsv"));
    }

    private static void checkSubgroups(UnifacParameters set, Path tsv) throws IOException {
        List<String> lines = Files.readAllLines(tsv);
        int rows = 0;
        for (String line : lines.subList(1, lines.size())) {
            if (line.isBlank()) {
                continue;
            }
            String[] c = line.split("\t");
            UnifacSubgroup s = set.subgroup(Integer.parseInt(c[0])).orElseThrow(() -> new AssertionError("missing subgroup " + c[0]));
            assertEquals(c[1], s.name());
            assertEquals(Integer.parseInt(c[2]), s.mainGroup());
            double r = Double.parseDouble(c[4]);
            if (set == UnifacParameters.liquidLiquid() && s.id() == 30) {
                // curation decision (documented in the resource header): the source prints 9183 for 0.9183
                assertEquals(9183, r, 0);
                r = 0.9183;
            }
            assertEquals(r, s.r(), 0, "R of " + s.name());
            assertEquals(Double.parseDouble(c[5]), s.q(), 0, "Q of " + s.name());
            rows++;
        }
        assertEquals(rows, set.subgroups().size());
    }

    private static void checkInteractions(UnifacParameters set, Path tsv) throws IOException {
        int rows = 0;
        for (String line : Files.readAllLines(tsv)) {
            if (line.isBlank()) {
                continue;
            }
            String[] c = line.split("\t");
            int m = Integer.parseInt(c[0]);
            int n = Integer.parseInt(c[1]);
            assertTrue(set.hasInteraction(m, n));
            assertEquals(Double.parseDouble(c[2]), set.a(m, n), 0, "a(" + m + "," + n + ")");
            rows++;
        }
        assertTrue(rows > 100);
    }
}
