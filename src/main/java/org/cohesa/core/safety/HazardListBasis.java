package org.cohesa.core.safety;

import org.cohesa.core.coverage.Provenance;
import org.cohesa.core.solvent.Solvent;

/**
 * What a solvent's hazard-statement list rests on, read from its source key (SOURCES.md's naming rules, see
 * {@link Provenance}): checked against a published classification, recalled from memory and not yet checked, or not
 * recorded at all.
 *
 * <p>Why it matters: the CHEM21 guide (Prat et al., Green Chem. 18 (2016) 288) does not score a solvent without
 * registered hazard data as clean. Its tables mark such a solvent's H3xx and H4xx columns "n.a." (not registered, as
 * opposed to "None": no statement after full REACH registration) and give it a health score of 5 and an environment
 * score of at least 5 — Table 8: γ-valerolactone, diethyl succinate and p-cymene (as transcribed from the paper, see
 * {@code chem21-ranks.csv}). A list recalled from memory is in the same position: nothing published was checked, and a
 * recalled list is more often short than long (propionitrile was recalled as H225 alone; its supplier SDS adds H300 and
 * H310). So the ranking ({@code HazardPenalty}) and the computed guide rank ({@link SolventGuide#computed}) treat a
 * recalled list like an unknown one: possibly incomplete.
 */
public enum HazardListBasis {
    /** checked against a published classification (Annex VI entry, SDS, ICSC, registrant dossier, GESTIS …) or entered by the user */
    CHECKED,
    /** recalled from memory (source key {@code memory-…}), not checked against a publication */
    RECALLED,
    /** no statements and no source for them: the library does not know */
    NOT_RECORDED;

    /** The basis of a solvent's hazard-statement list. */
    public static HazardListBasis of(Solvent s) {
        String key = s.sources().get("hazard_statements");
        if (key == null || key.isBlank()) {
            return s.hazardStatements().isEmpty() ? NOT_RECORDED : CHECKED;
        }
        return Provenance.of(key, s.userEntry()) == Provenance.RECALLED ? RECALLED : CHECKED;
    }

    /** True when the list may be incomplete: recalled or not recorded. */
    public boolean mayBeIncomplete() {
        return this != CHECKED;
    }
}
