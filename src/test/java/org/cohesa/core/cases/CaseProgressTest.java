package org.cohesa.core.cases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.cases.SubstitutionCase.CaseMaterial;
import org.cohesa.core.records.RecordStatus;
import org.junit.jupiter.api.Test;

/** The step strip's words: each step says what is done or what is missing (invented demo case). */
class CaseProgressTest {

    private static final Instant NOW = Instant.parse("2026-12-03T09:00:00Z");

    @Test
    void aNewCaseMissesEveryStepAndStartsWithTheMaterial() {
        SubstitutionCase c = SubstitutionCase.start("Find a liquid (demo)", SubstitutionCase.Kind.FIND, "", "", NOW);
        List<CaseProgress.State> s = CaseProgress.of(c);
        assertEquals(5, s.size());
        assertTrue(s.stream().noneMatch(CaseProgress.State::done));
        assertEquals("no material yet", s.get(0).text());
        assertEquals(CaseStep.MATERIAL, CaseProgress.next(c));
    }

    @Test
    void stepsFillInOrderAndChecksAreCountedPerChosenCandidate() {
        SubstitutionCase c = SubstitutionCase.start("Demo", SubstitutionCase.Kind.REPLACE, "toluene", "thinner", NOW)
                .withMaterial(new CaseMaterial("demo resin", "typed in", 18.5, 9, 8, 8));
        assertEquals("demo resin · R0 8.0 MPa½", CaseProgress.of(c).get(0).text());
        assertEquals(CaseStep.LIMITS, CaseProgress.next(c));
        c = c.withSearch(Map.of("red-limit", "0.8", "no-cmr", "true"), List.of("acetone:1", "ethyl acetate:0.5,acetone:0.5"));
        assertEquals("RED ≤ 0.8 · no CMR", CaseProgress.of(c).get(1).text());
        assertEquals("2 found, none chosen yet", CaseProgress.of(c).get(2).text());
        c = c.choose("acetone:1", 0.5).choose("acetone:1", 0.5);
        assertEquals(1, c.chosen().size());
        c = c.update(c.chosen().get(0).withSafety("ok").withDrying("ok"));
        CaseProgress.State checks = CaseProgress.of(c).get(3);
        assertFalse(checks.done());
        assertEquals("2 of 3 checks done", checks.text());
        c = c.update(c.chosen().get(0).withMiscibility("one phase"));
        assertEquals(CaseStep.RECORD, CaseProgress.next(c));
        c = c.withRecord(4);
        assertTrue(CaseProgress.of(c).stream().allMatch(CaseProgress.State::done));
        assertEquals("record 4 filed", CaseProgress.of(c).get(4).text());
    }

    @Test
    void aNewMaterialDropsTheCandidatesFoundForTheOldOne() {
        SubstitutionCase c = SubstitutionCase.start("Demo", SubstitutionCase.Kind.FIND, "", "", NOW)
                .withMaterial(new CaseMaterial("a", "", 18, 5, 5, 6))
                .withSearch(Map.of("red-limit", "0.8"), List.of("acetone:1")).choose("acetone:1", 0.3);
        SubstitutionCase d = c.withMaterial(new CaseMaterial("b", "", 17, 9, 9, 7));
        assertTrue(d.found().isEmpty());
        assertTrue(d.chosen().isEmpty());
        assertEquals(c, c.withMaterial(c.material()));
    }

    @Test
    void badHeadersAreRefusedNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> SubstitutionCase.start("  ", SubstitutionCase.Kind.FIND, "", "", NOW));
        assertTrue(e.getMessage().contains("title"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> SubstitutionCase.start("x", SubstitutionCase.Kind.REPLACE, "", "", NOW));
        assertTrue(e.getMessage().contains("replaced liquid"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> SubstitutionCase.start("x".repeat(201), SubstitutionCase.Kind.FIND, "", "", NOW));
    }

    @Test
    void changedLimitsAndAnUndecidedRecordKeepTheirStepsOpen() {
        SubstitutionCase c = SubstitutionCase.start("Demo", SubstitutionCase.Kind.REPLACE, "toluene", "thinner", NOW)
                .withMaterial(new CaseMaterial("demo resin", "typed in", 18.5, 9, 8, 8))
                .withSearch(Map.of("red-limit", "0.8", "families", "esters;ketones", "with-water", "separates from water (extraction)"),
                        List.of("acetone:1"));
        assertEquals("RED ≤ 0.8 · only esters, ketones · separates from water", CaseProgress.of(c).get(1).text());
        CaseProgress.State changed = CaseProgress.of(c, new CaseProgress.Facts(true, null)).get(1);
        assertFalse(changed.done());
        assertEquals("changed since the last search: search again", changed.text());
        c = c.choose("acetone:1", 0.4).withRecord(7);
        CaseProgress.State draft = CaseProgress.of(c, new CaseProgress.Facts(false, RecordStatus.DRAFT)).get(4);
        assertFalse(draft.done());
        assertEquals("record 7 draft: send it to review", draft.text());
        assertFalse(CaseProgress.of(c, new CaseProgress.Facts(false, RecordStatus.IN_REVIEW)).get(4).done());
        CaseProgress.State approved = CaseProgress.of(c, new CaseProgress.Facts(false, RecordStatus.APPROVED)).get(4);
        assertTrue(approved.done());
        assertEquals("record 7 approved", approved.text());
        assertTrue(CaseProgress.of(c, new CaseProgress.Facts(false, RecordStatus.REJECTED)).get(4).done());
    }
}
