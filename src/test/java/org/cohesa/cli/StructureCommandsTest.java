package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StructureCommandsTest {

    @TempDir
    Path dir;

    private Path db() {
        return dir.resolve("cohesa.db");
    }

    @Test
    void estimatePrintsValuesRoutesAndGroupsAndStoresNothing() {
        // Ethyl acetate: published (15.8, 5.3, 7.2) MPa½ (Alshehri 2022 table); DDBST groups CH3 + CH2 + CH3COO.
        CliTestSupport.Result r = CliTestSupport.run(db(), "estimate", "CCOC(C)=O", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertEquals("C4H8O2", j.get("structure").get("formula").asText());
        // both group methods cover it: the default route is their mean, within that route's P90 of the published value
        assertEquals("group contribution (mean of Mathieu 2018 and Stefanis–Panayiotou 2008/2012)", j.get("dP").get("route").asText());
        for (String c : new String[] {"dD", "dP", "dH"}) {
            double published = c.equals("dD") ? 15.8 : c.equals("dP") ? 5.3 : 7.2;
            assertTrue(Math.abs(j.get(c).get("value").asDouble() - published) <= j.get(c).get("expectedP90").asDouble(), j.toString());
        }
        assertEquals(1, j.get("unifac").get("groups").get("21").asInt());
        // each group method's own values are shown beside the mean, with the Stefanis–Panayiotou groups found
        // (ethyl acetate: CH3COO + CH2 + CH3, from the group names of Stefanis & Panayiotou's Table A.1)
        JsonNode methods = j.get("groupMethods");
        assertEquals("Mathieu 2018", methods.get(0).get("method").asText());
        assertEquals(1, methods.get(1).get("firstOrder").get("CH3COO").asInt());
        assertEquals((methods.get(0).get("dP").asDouble() + methods.get(1).get("dP").asDouble()) / 2, j.get("dP").get("value").asDouble(), 1e-9);
        assertTrue(CliTestSupport.run(db(), "estimate", "CCOC(C)=O").out().contains("group method Stefanis–Panayiotou 2008/2012: δD"));
        assertTrue(j.get("molarVolume").get("estimated").asBoolean());
        CliTestSupport.Result table = CliTestSupport.run(db(), "estimate", "CCOC(C)=O", "--density", "0.900", "--dipole", "1.78");
        assertTrue(table.out().contains("dipole moment (Hansen–Beerbower)"), table.out());
        assertTrue(table.out().contains("molar mass / given density"), table.out());
        // ΔHvap(298 K) 35.6 kJ/mol and n_D 1.3723 for ethyl acetate (CRC Handbook; from memory): δt within the route's P90 (1.60) of the
        // published √(15.8² + 5.3² + 7.2²) = 18.2, in the table and the JSON, which keeps the estimate's own fields
        CliTestSupport.Result dt = CliTestSupport.run(db(), "estimate", "CCOC(C)=O", "--density", "0.900", "--refractive-index", "1.3723",
                "--dipole", "1.78", "--hvap", "35.6", "--json");
        assertEquals(0, dt.exitCode(), dt.err());
        assertTrue(Math.abs(dt.json().get("dt").get("value").asDouble() - Math.sqrt(15.8 * 15.8 + 5.3 * 5.3 + 7.2 * 7.2)) <= 1.60, dt.out());
        assertEquals("C4H8O2", dt.json().get("structure").get("formula").asText());
        assertTrue(dt.json().get("dH_remainder").get("route").asText().startsWith("remainder"), dt.out());
        assertTrue(CliTestSupport.run(db(), "estimate", "CCOC(C)=O", "--hvap", "35.6").out().contains("check: √(δD² + δP² + δH²)"));
        assertEquals(2, CliTestSupport.run(db(), "estimate", "CCOC(C)=O", "--hvap", "2").exitCode());
        CliTestSupport.Result mine = CliTestSupport.run(db(), "solvents", "--mine", "--json");
        assertEquals(0, mine.json().size(), "estimate must not store anything");
    }

    @Test
    void badStructuresGetOneLineAndExit2() {
        for (String bad : new String[] {"C1CC", "[CH3]", "CC(=O)[O-].[Na+]", "CC[Sn](C)(C)C"}) {
            CliTestSupport.Result r = CliTestSupport.run(db(), "estimate", bad);
            assertEquals(2, r.exitCode(), bad);
            String line = (r.err() + r.out()).strip();
            assertEquals(1, line.lines().count(), line);
            assertTrue(line.contains("SMILES '" + bad + "'"), line);
        }
        CliTestSupport.Result add = CliTestSupport.run(db(), "solvents", "add", "--name", "tin thing", "--smiles", "CC[Sn](C)(C)C");
        assertEquals(2, add.exitCode());
        assertTrue((add.err() + add.out()).contains("--smiles"), add.err());
        assertEquals(0, CliTestSupport.run(db(), "solvents", "--mine", "--json").json().size(), "nothing stored");
    }

    @Test
    void aSolventAddedByItsStructureIsStoredWithItsEstimatesMarked() {
        CliTestSupport.Result r = CliTestSupport.run(db(), "solvents", "add", "--name", "my ester", "--smiles", "CCOCCC(=O)OCC", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = CliTestSupport.run(db(), "solvents", "my ester", "--mine", "--json").json().get(0);
        assertTrue(s.toString().contains("C7H14O3"), s.toString());
        assertTrue(s.toString().contains("estimate-structure-groups"), s.toString());
        assertTrue(s.toString().contains("1:2 2:2 22:1 25:1") || s.toString().contains("\"22\""), s.toString());
        // a measured value the user gives wins over the estimate
        CliTestSupport.Result given = CliTestSupport.run(db(), "solvents", "add", "--name", "my ester 2", "--smiles", "CCOCCC(=O)OCC",
                "--dD", "16.0", "--dP", "3.3", "--dH", "8.8");
        assertEquals(0, given.exitCode(), given.err());
        assertFalse(given.out().contains("δD 15.8 estimated"), given.out());
    }

    @Test
    void measuredPropertiesGiveTheSameEntryAsTheDesktopForm() {
        // DMSO: no group δP (S=O); ρ 1.100 g/cm³, n_D 1.4793, μ 3.96 D (CRC Handbook; from memory)
        CliTestSupport.Result r = CliTestSupport.run(db(), "solvents", "add", "--name", "my dmso", "--smiles", "CS(C)=O", "--set", "density=1.100",
                "--refractive-index", "1.4793", "--dipole", "3.96", "--json");
        assertEquals(0, r.exitCode(), r.err());
        java.util.Map<String, String> row = new java.util.LinkedHashMap<>(java.util.Map.of("name", "my dmso", "density", "1.100"));
        org.cohesa.store.StructureEntries.fillSolventRow(row, org.cohesa.store.StructureEntries.estimate("SMILES", "CS(C)=O",
                new org.cohesa.core.structure.MeasuredProperties(1.100, 1.4793, 3.96, null)), new org.cohesa.store.StructureEntries.Fields("", "", "", ""),
                "CS(C)=O");
        assertEquals(Double.parseDouble(row.get("dP")), r.json().get("dP").asDouble(), 1e-9, r.out());
        assertTrue(r.json().toString().contains("dipole moment (Hansen–Beerbower)"), r.out());
        CliTestSupport.Result bad = CliTestSupport.run(db(), "solvents", "add", "--name", "my dmso 2", "--smiles", "CS(C)=O", "--dipole", "40");
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().startsWith("error: --dipole '40': must be between"), bad.err());
        CliTestSupport.Result alone = CliTestSupport.run(db(), "solvents", "add", "--name", "my dmso 3", "--dipole", "3.96");
        assertEquals(2, alone.exitCode());
        assertTrue(alone.err().contains("--dipole '3.96': is used with --smiles only"), alone.err());
    }

    @Test
    void aDrugSubstanceByItsStructureGetsTheDefaultRadiusWithACaution() {
        CliTestSupport.Result r = CliTestSupport.run(db(), "materials", "add", "--name", "ibuprofen test", "--smiles", "CC(C)Cc1ccc(cc1)C(C)C(=O)O");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("R0 7.0 is a default screening radius"), r.out());
        assertTrue(r.out().contains("cohesa fit"), r.out());
        CliTestSupport.Result blend = CliTestSupport.run(db(), "blend", "--material", "ibuprofen test", "--json");
        assertEquals(0, blend.exitCode(), blend.err());
    }
}
