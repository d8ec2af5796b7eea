package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MaterialRepositoryTest {

    @TempDir
    Path dir;

    private static BundledData table(String rows) {
        return new BundledData("materials.csv", ("name,synonyms,kind,dD,dP,dH,r0,source,note\n" + rows).getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void openingLoadsTheBundledMaterials() {
        try (Database db = Database.open(dir.resolve("a.db"))) {
            List<Material> all = new MaterialRepository(db).all();
            assertTrue(all.size() >= 40);
            assertTrue(all.stream().noneMatch(Material::userEntry));
            assertEquals(Migrations.latest(), currentVersion(db));
        }
    }

    @Test
    void userMaterialsSurviveAChangedBundledTable() {
        Path file = dir.resolve("b.db");
        try (Database db = Database.open(file, BundledData.resource("solvents.csv"), table("resin A,RA,resin,18,8,8,7,k,\n"))) {
            MaterialRepository repo = new MaterialRepository(db);
            repo.add(new Material("my binder", List.of("MB1"), MaterialKind.RESIN, SolubilitySphere.of(17.5, 7.0, 6.0, 8.0), "fit of lab series 12", null, false));
            assertEquals(2, repo.all().size());
            assertFalse(repo.syncBundled(table("resin A,RA,resin,18,8,8,7,k,\n")), "same table: nothing to do");
        }
        try (Database db = Database.open(file, BundledData.resource("solvents.csv"), table("resin B,,resin,19,9,9,6,k,\n"))) {
            List<Material> all = new MaterialRepository(db).all();
            assertEquals(List.of("my binder", "resin B"), all.stream().map(Material::name).toList());
            Material mine = all.get(0);
            assertTrue(mine.userEntry());
            assertEquals(8.0, mine.sphere().r0());
        }
    }

    @Test
    void takenNamesAndBundledRemovalsAreRefused() {
        try (Database db = Database.open(dir.resolve("c.db"), BundledData.resource("solvents.csv"), table("resin A,RA,resin,18,8,8,7,k,\n"))) {
            MaterialRepository repo = new MaterialRepository(db);
            Material clash = new Material("ra", List.of(), MaterialKind.OTHER, SolubilitySphere.of(18, 8, 8, 7), "x", null, true);
            assertThrows(InvalidInputException.class, () -> repo.add(clash));
            assertThrows(InvalidInputException.class, () -> repo.remove("resin A"));
            assertEquals(1, repo.all().size());
        }
    }

    private static int currentVersion(Database db) {
        try {
            return Migrations.currentVersion(db.connection());
        } catch (java.sql.SQLException e) {
            throw new IllegalStateException(e);
        }
    }
}
