package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.cases.SubstitutionCase.CaseMaterial;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Cases are saved whole, reopened equal, and a failed save changes nothing (schema step 7). */
class CaseRepositoryTest {

    @TempDir
    Path dir;

    private static final Instant T0 = Instant.parse("2026-12-03T09:00:00Z");

    /** An invented demo case (no real process). */
    private static SubstitutionCase demo() {
        return SubstitutionCase.start("Thinner for line 2 (invented demo)", SubstitutionCase.Kind.REPLACE, "toluene", "alkyd enamel thinner", T0)
                .withMaterial(new CaseMaterial("medium-oil alkyd", "demo", 18.5, 9.0, 8.0, 8.0))
                .withSearch(Map.of("red-limit", "0.8", "max-components", "3", "no-cmr", "true"),
                        List.of("n-butyl acetate:0.6,ethyl acetate:0.4", "acetone:1"))
                .choose("n-butyl acetate:0.6,ethyl acetate:0.4", 0.42);
    }

    @Test
    void aSavedCaseReopensWithEverythingItHeld() {
        try (Database db = Database.openWithoutSync(dir.resolve("c.db"))) {
            CaseRepository repo = new CaseRepository(db);
            SubstitutionCase c = demo();
            c = c.update(c.chosen().get(0).withSafety("flash point 14 °C (estimated) · GHS category 2"));
            SubstitutionCase saved = repo.save(c, T0.plusSeconds(60));
            assertTrue(saved.id() > 0);
            SubstitutionCase back = repo.find(saved.id()).orElseThrow();
            assertEquals(saved, back);
            assertEquals("flash point 14 °C (estimated) · GHS category 2", back.chosen().get(0).safety());
            assertEquals(null, back.chosen().get(0).drying());
            assertEquals(0.42, back.chosen().get(0).red(), 0);
        }
    }

    @Test
    void savingAgainOverwritesAndTheListShowsTheNewestFirst() {
        try (Database db = Database.openWithoutSync(dir.resolve("d.db"))) {
            CaseRepository repo = new CaseRepository(db);
            SubstitutionCase a = repo.save(demo(), T0.plusSeconds(1));
            SubstitutionCase b = repo.save(SubstitutionCase.start("Resin for a primer (invented demo)", SubstitutionCase.Kind.FIND, "", "", T0),
                    T0.plusSeconds(2));
            repo.save(a.withRecord(3), T0.plusSeconds(3));
            List<CaseRepository.Summary> list = repo.list();
            assertEquals(List.of(a.id(), b.id()), list.stream().map(CaseRepository.Summary::id).toList());
            assertEquals(3L, repo.find(a.id()).orElseThrow().recordId());
            assertEquals("medium-oil alkyd", list.get(0).material());
        }
    }

    @Test
    void aFailedSaveLeavesTheStoredCaseAsItWas() throws Exception {
        try (Database db = Database.openWithoutSync(dir.resolve("e.db"))) {
            CaseRepository repo = new CaseRepository(db);
            SubstitutionCase saved = repo.save(demo(), T0.plusSeconds(1));
            try (Statement st = db.connection().createStatement()) {
                // a write that fails inside the transaction (as a full disk would)
                st.execute("CREATE TEMP TRIGGER stop_case_update BEFORE UPDATE ON substitution_case BEGIN SELECT RAISE(ABORT, 'disk trouble'); END");
            }
            SubstitutionCase changed = saved.withRecord(9).unchoose(saved.chosen().get(0).blend());
            StoreException e = assertThrows(StoreException.class, () -> repo.save(changed, T0.plusSeconds(2)));
            assertTrue(e.getMessage().contains("nothing was changed"), e.getMessage());
            assertEquals(saved, repo.find(saved.id()).orElseThrow());
        }
    }

    @Test
    void savingACaseThatIsNoLongerStoredIsRefused() {
        try (Database db = Database.openWithoutSync(dir.resolve("f.db"))) {
            CaseRepository repo = new CaseRepository(db);
            SubstitutionCase ghost = demo().withId(77, T0);
            assertThrows(InvalidInputException.class, () -> repo.save(ghost, T0));
            assertTrue(repo.list().isEmpty());
        }
    }
}
