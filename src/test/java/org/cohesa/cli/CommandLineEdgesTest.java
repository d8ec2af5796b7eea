package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.cohesa.LauncherAccess;
import org.cohesa.cli.CliTestSupport.Result;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line's rough edges from a new user's sweep (issue 18): every message has the form
 * {@code error: field 'value': reason}, JSON errors under {@code --json}, a refused {@code --db} typo, files that are
 * not what they should be, free-text limits, and the files {@code dry} and {@code fit} can write.
 */
class CommandLineEdgesTest {

    @TempDir
    Path dir;

    private Result run(String... args) {
        return CliTestSupport.run(dir.resolve("cohesa.db"), args);
    }

    /** Runs without the test support's own --db, for the --db checks themselves. */
    private static Result raw(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Result(code, out.toString(), err.toString());
    }

    private static void oneErrorLine(Result r, String expectedStart) {
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().startsWith("error: " + expectedStart), r.err());
        assertFalse(r.err().contains("Error: "), "picocli's own prefix is gone: " + r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void withoutADisplayTheFirstCommandShowsABlendSearchAndSucceeds() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = LauncherAccess.demonstrate(new PrintWriter(out), new PrintWriter(err), List.of("--db", dir.resolve("demo.db").toString()));
        assertEquals(0, code, err.toString());
        String text = out.toString();
        assertTrue(text.contains("No display found"), text);
        assertTrue(text.contains("blend --material PMMA"), text);
        assertTrue(text.contains("target: δD 18.6"), "the search ran and printed its target: " + text);
        assertTrue(text.contains("java -jar ") && text.contains(" --help"), text);
    }

    @Test
    void dbInAMissingFolderIsRefusedAndNothingIsCreated() {
        Path missing = dir.resolve("no/such/dir/x.db");
        Result r = raw("solvents", "--db", missing.toString());
        oneErrorLine(r, "--db '" + missing + "': the folder");
        assertFalse(Files.exists(dir.resolve("no")), "no folder was created");

        Result folder = raw("solvents", "--db", dir.toString());
        oneErrorLine(folder, "--db '" + dir + "': is a folder");
    }

    @Test
    void dbThatIsNotAnSqliteFileIsNamedAsSuch() throws IOException {
        Path junk = dir.resolve("junk.db");
        Files.writeString(junk, "this is a text file, not a database");
        Result r = raw("solvents", "--db", junk.toString());
        oneErrorLine(r, "--db '" + junk + "': is not a Cohesa database (not an SQLite file)");
        assertFalse(r.err().contains("SQLITE_"), r.err());
        assertEquals("this is a text file, not a database", Files.readString(junk), "the file is left as it was");
    }

    @Test
    void picocliMessagesInOurWording() {
        oneErrorLine(run("blend"), "give --target or --material (see cohesa blend --help)");
        oneErrorLine(run("hazards", "--solvent", "toluene", "--temperature", "abc"), "--temperature 'abc': not a number");
        oneErrorLine(run("hazards", "--solvent", "toluene", "--temperature", "1e400"), "--temperature '1e400': not a finite number");
        oneErrorLine(run("bench", "fit", "--runs", "x"), "--runs 'x': not a whole number");
        Result unknown = run("blnd");
        oneErrorLine(unknown, "command 'blnd': not a command of cohesa (did you mean blend");
        oneErrorLine(run("blend", "--materal", "PMMA"), "option '--materal': not an option of cohesa blend (did you mean --material");
        oneErrorLine(run("solvent", "toluene", "benzene"), "argument 'benzene'");
    }

    @Test
    void anEmptyNameIsSaidToBeEmptyNotAnsweredWithSuggestions() {
        Result r = run("solvent", "");
        oneErrorLine(r, "NAME '': empty");
        assertFalse(r.err().contains("did you mean"), r.err());
        oneErrorLine(run("material", " "), "NAME ' ': empty");
    }

    @Test
    void aDecisionWithoutAnApproverNamesTheApproverNotTheComment() {
        Result add = run("record", "add", "--process", "p (invented)", "--site", "s (invented)", "--replaced", "toluene",
                "--replacement", "ethyl acetate", "--reason", "test", "--author", "A. Author", "--target", "18,9,8,7");
        assertEquals(0, add.exitCode(), add.err());
        oneErrorLine(run("record", "approve", "1", "--by", ""), "--by '': must name a person");
        Result noComment = run("record", "approve", "1", "--by", "M. Manager");
        assertFalse(noComment.err().contains("'null'"), noComment.err());
    }

    @Test
    void filesThatAreNotUsableAreNamedWithTheirArgument() throws IOException {
        oneErrorLine(run("fit", dir.toString()), "FILE '" + dir + "': is a folder, not a file");
        Path binary = dir.resolve("binary.csv");
        Files.write(binary, new byte[] {(byte) 0xC3, (byte) 0x28, 0x00, (byte) 0xFF, 0x41});
        Result r = run("solvents", "import", binary.toString());
        oneErrorLine(r, "FILE '" + binary + "': not UTF-8 text");
        assertFalse(r.err().contains("line 0"), r.err());
        Path open = dir.resolve("open-quote.csv");
        Files.writeString(open, "liquid,score\n\"acetone,1\n", StandardCharsets.UTF_8);
        oneErrorLine(run("fit", open.toString()), "FILE '" + open + "': not a readable CSV table: the quoted field that opens on line 2 is never closed");
    }

    @Test
    void underJsonAnErrorIsAJsonObjectWithTheSameExitCode() {
        Result r = run("hazards", "--solvent", "toluene", "--temperature", "abc", "--json");
        assertEquals(2, r.exitCode());
        JsonNode e = r.json().get("error");
        assertEquals("--temperature", e.get("field").asText());
        assertEquals("abc", e.get("value").asText());
        assertEquals("not a number", e.get("reason").asText());
        assertEquals(2, e.get("exit_code").asInt());

        Result unknownSolvent = run("solvent", "unobtainium", "--json");
        assertEquals(2, unknownSolvent.exitCode());
        assertEquals("NAME", unknownSolvent.json().get("error").get("field").asText());

        Result missing = run("blend", "--json");
        assertEquals(2, missing.exitCode());
        assertTrue(missing.json().get("error").get("reason").asText().startsWith("give --target or --material"));
    }

    @Test
    void namesHaveALengthLimitAndNoDirectionOverrides() {
        String longName = "x".repeat(500);
        oneErrorLine(run("materials", "add", "--name", longName, "--dD", "18", "--dP", "5", "--dH", "5", "--r0", "5"),
                "name 'xxxxxxxxxx");
        Result rlo = run("materials", "add", "--name", "ab\u202Ecd", "--dD", "18", "--dP", "5", "--dH", "5", "--r0", "5");
        oneErrorLine(rlo, "name 'ab?cd': contains control or text-direction characters");
        assertEquals(0, run("materials", "--json").exitCode());
        assertFalse(run("materials").out().contains("xxxxxxxxxx"), "nothing was stored");
    }

    @Test
    void dryWritesItsPathAsCsvAndPngAndRefusesToOverwrite() throws IOException {
        Path csv = dir.resolve("path.csv");
        Path png = dir.resolve("path.png");
        Result r = run("dry", "--blend", "acetone:0.3,n-butyl acetate:0.7", "--target", "18.6,10.5,7.5,8.6", "--csv", csv.toString(),
                "--png", png.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = Files.readAllLines(csv);
        assertEquals("evaporated_pct,relative_time,phi acetone,phi n-butyl acetate,dD_MPa0.5,dP_MPa0.5,dH_MPa0.5,RED", lines.get(0));
        assertTrue(lines.get(1).startsWith("0.0000,0.000000,0.300000,0.700000,"), lines.get(1));
        assertTrue(lines.size() > 15, "a row per point: " + lines.size());
        var img = ImageIO.read(png.toFile());
        assertTrue(img.getWidth() >= 1000 && img.getHeight() >= 400, img.getWidth() + "x" + img.getHeight());

        Result again = run("dry", "--blend", "acetone:0.3,n-butyl acetate:0.7", "--csv", csv.toString());
        oneErrorLine(again, "--csv '" + csv + "': already exists; give --overwrite to replace it");
        assertEquals(lines, Files.readAllLines(csv), "the first file is untouched");
        assertEquals(0, run("dry", "--blend", "acetone:0.3,n-butyl acetate:0.7", "--csv", csv.toString(), "--overwrite").exitCode());
        assertTrue(Files.readAllLines(csv).get(0).endsWith(",RED"));
        try (var left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary file is left behind");
        }
    }

    @Test
    void aDeviceIsNeverReplacedByAPlot() {
        Path dev = Path.of("/dev/null");
        if (!Files.exists(dev)) {
            return;
        }
        Result r = run("dry", "--blend", "acetone:0.3,n-butyl acetate:0.7", "--png", dev.toString(), "--overwrite");
        oneErrorLine(r, "--png '/dev/null': exists and is not a regular file; it is never replaced");
        assertFalse(Files.isRegularFile(dev), "/dev/null is still a device");
    }

    @Test
    void fitDrawsTheSphereAndTheTestedLiquids() throws IOException {
        Path png = dir.resolve("fit.png");
        Result r = run("fit", "demo-blends/resin-k17-tests.csv", "--resamples", "0", "--png", png.toString());
        assertEquals(0, r.exitCode(), r.err());
        var img = ImageIO.read(png.toFile());
        assertEquals(1500, img.getWidth());
        // the three panels are drawn: count non-white pixels in each third
        for (int panel = 0; panel < 3; panel++) {
            int inked = 0;
            for (int x = panel * 500 + 60; x < panel * 500 + 480; x += 2) {
                for (int y = 40; y < 460; y += 2) {
                    if ((img.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF) {
                        inked++;
                    }
                }
            }
            assertTrue(inked > 500, "panel " + panel + " has content: " + inked);
        }
    }

    @Test
    void editDistanceIsLevenshtein() {
        // "kitten" -> "sitting" = 3 is the textbook example (Levenshtein 1966, as in most algorithm texts; from memory)
        assertEquals(3, ErrorHandling.editDistance("kitten", "sitting"));
        assertEquals(0, ErrorHandling.editDistance("blend", "blend"));
        assertEquals(List.of("blend"), ErrorHandling.closest("blnd", List.of("blend", "replace", "dry")));
    }
}
