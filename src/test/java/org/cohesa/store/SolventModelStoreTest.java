package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.solvent.Antoine;
import org.cohesa.core.solvent.Dippr101;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.Wagner25;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The solvent model's newer fields (SMILES, families, vapour-pressure correlation) through CSV and the database. */
class SolventModelStoreTest {

    @TempDir
    Path dir;

    // ethanol: DIPPR 101 coefficients of Perry's Handbook 8th ed. (2008) Table 2-8; Wagner (VDI Heat Atlas 2010, PPDS)
    private static final String MODERN = "name,cas,smiles,src_smiles,family,families,vp_equation,vp_c1,vp_c2,vp_c3,vp_c4,vp_c5,vp_tmin_k,vp_tmax_k,vp_tc_k,vp_pc_pa,src_vapour_pressure\n"
            + "my ethanol,64-17-5,CCO,pubchem,alcohol,alcohol;other,dippr-101,73.304,-7122.3,-7.1424,2.8853E-06,2,159.05,514,,,perry-2008-dippr101\n"
            + "my ethanol 2,,CCO,pubchem,alcohol,,wagner-2.5-5,-8.33803,0.0872,-3.30575,-0.26001,,159.05,513.9,513.9,6148000,vdi-2010-wagner\n";

    private static List<Solvent> read(String csv) throws Exception {
        return SolventCsv.read("user.csv", new StringReader(csv), true);
    }

    @Test
    void theNewColumnsReadAndWriteBackUnchanged() throws Exception {
        List<Solvent> in = read(MODERN);
        Solvent a = in.get(0);
        assertEquals("CCO", a.smiles());
        assertEquals(List.of("alcohol", "other"), a.families());
        assertEquals("alcohol", a.family());
        Dippr101 d = assertInstanceOf(Dippr101.class, a.vapourPressure());
        assertEquals(2.8853e-06, d.c4(), 0);
        assertEquals("perry-2008-dippr101", d.source());
        assertEquals("perry-2008-dippr101", a.sources().get("vapour_pressure"));
        assertEquals(List.of("alcohol"), in.get(1).families());
        assertInstanceOf(Wagner25.class, in.get(1).vapourPressure());
        StringWriter w = new StringWriter();
        SolventCsv.write(w, in);
        List<Solvent> back = read(w.toString());
        assertEquals(in, back);
    }

    @Test
    void aUserFileWithTheOlderAntoineColumnsStillImports() throws Exception {
        // Poling et al. (2000) Antoine constants of ethanol, in the columns files used before schema version 5
        Solvent s = read("name,antoine_a,antoine_b,antoine_c,antoine_tmin_k,antoine_tmax_k,src_antoine\n"
                + "old ethanol,10.33675,1648.22,-42.232,276.5,369.54,poling-2000-antoine\n").get(0);
        Antoine a = assertInstanceOf(Antoine.class, s.vapourPressure());
        assertEquals(1648.22, a.b(), 0);
        assertEquals("poling-2000-antoine", s.sources().get("vapour_pressure"));
        assertNull(s.sources().get("antoine"));
    }

    @Test
    void badCorrelationCellsAreListedAndNothingIsRead() {
        String csv = "name,vp_equation,vp_c1,vp_c2,vp_c3,antoine_a\n"
                + "unknown form,antoine-log2,1,2,3,\n"
                + "missing coefficient,antoine-ln,1,2,,\n"
                + "no equation,,1,2,3,\n"
                + "both forms,antoine-log10,1,2,3,9\n";
        BadRowsException e = assertThrows(BadRowsException.class, () -> read(csv));
        assertEquals(4, e.errors().size(), e.errors().toString());
        assertTrue(e.errors().get(0).reason().contains("unknown vapour-pressure equation"), e.errors().get(0).describe());
        assertTrue(e.errors().get(1).reason().contains("vp_c3"), e.errors().get(1).describe());
        assertEquals("vp_equation", e.errors().get(2).column());
        assertTrue(e.errors().get(3).reason().contains("not both"), e.errors().get(3).describe());
    }

    @Test
    void schemaStepFiveKeepsUserSolventsTheirAntoineConstantsAndPrices() throws Exception {
        Path file = dir.resolve("v4.db");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            for (Migration m : Migrations.ALL.subList(0, 4)) {
                for (String sql : m.statements()) {
                    st.execute(sql);
                }
            }
            st.execute("PRAGMA user_version = 4");
            // a user row as schema 4 stored it: Poling's ethanol constants with their source key, and a price
            st.execute("INSERT INTO solvent (name, origin, family, dD, dP, dH, antoine_a, antoine_b, antoine_c, antoine_tmin_k, antoine_tmax_k,"
                    + " sources) VALUES ('house ethanol', 'user', 'alcohol', 15.8, 8.8, 19.4, 10.33675, 1648.22, -42.232, 276.5, 369.54,"
                    + " '{\"hsp\":\"memory-hansen-handbook\",\"antoine\":\"poling-2000-antoine\"}')");
            st.execute("INSERT INTO solvent_price (solvent_name, price_per_litre) VALUES ('house ethanol', 3.25)");
        }
        BundledData bundled = new BundledData("solvents.csv",
                "name,cas,dD,dP,dH,src_hsp\ntoluene,108-88-3,18.0,1.4,2.0,alshehri-2022\n".getBytes(StandardCharsets.UTF_8));
        try (Database db = Database.open(file, bundled)) {
            assertEquals(Migrations.latest(), Migrations.currentVersion(db.connection()));
            Solvent s = new SolventRepository(db).library().resolve("x", "house ethanol");
            assertTrue(s.userEntry());
            assertEquals(3.25, s.pricePerLitre());
            assertEquals(List.of("alcohol"), s.families());
            Antoine a = assertInstanceOf(Antoine.class, s.vapourPressure());
            assertEquals(10.33675, a.a(), 0);
            assertEquals(369.54, a.tmaxK(), 0);
            assertEquals("poling-2000-antoine", s.sources().get("vapour_pressure"));
            assertNull(s.sources().get("antoine"));
            assertEquals("memory-hansen-handbook", s.sources().get("hsp"));
            // the bundled rows were rebuilt from the shipped table
            assertEquals(2, new SolventRepository(db).all().size());
        }
    }

    @Test
    void theBundledTableLoadsWithItsCorrelationsAndSmiles() {
        try (Database db = Database.open(dir.resolve("b.db"))) {
            Solvent ethanol = new SolventRepository(db).library().resolve("x", "ethanol");
            assertEquals("CCO", ethanol.smiles());
            // CRC Handbook 95th ed.: Tb of ethanol 78.29 °C → 101.325 kPa within 5 %
            double p = ethanol.vapourPressure().pressurePa(ethanol.boilingPointC() + 273.15);
            assertEquals(101_325.0, p, 0.05 * 101_325.0);
        }
    }
}
