package org.cohesa.core.records;

import java.util.Map;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.DryingRequest;
import org.cohesa.core.drying.DryingSimulator;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.Blend;

/**
 * Takes the whole evidence snapshot for a substitution from the workflows: liquids, target, Ra/RED
 * ({@link EvidenceBuilder}), the safety profile and cautions of both liquids ({@code org.cohesa.core.safety}),
 * with a target, both liquids' drying paths at 25 °C to 95 % evaporated ({@code org.cohesa.core.drying} defaults), and
 * the ranking terms of the replacement ({@link RankingEvidence}: the `why` replace prints).
 * A workflow that cannot describe a liquid leaves a note in its section instead of failing the filing.
 */
public final class EvidenceAssembler {

    /** Temperature of the filed safety profile (exposure estimate), K: 25 °C, the usual reference. */
    public static final double PROFILE_KELVIN = 298.15;

    private EvidenceAssembler() {
    }

    /**
     * @param target     the material that must stay dissolved, or null
     * @param citations  source key → citation (the bundled catalogue)
     * @param appVersion the program version, filed with the snapshot
     */
    private static String basis(SafetyProfile p) {
        return p.flashPoint().status().name().toLowerCase(java.util.Locale.ROOT) + (p.flashPoint().model() == null ? "" : ": " + p.flashPoint().model());
    }

    public static Evidence assemble(Blend replaced, Blend replacement, TargetRef target, Map<String, String> citations, String appVersion) {
        EvidenceBuilder b = new EvidenceBuilder(replaced, replacement, appVersion).citations(citations);
        if (target != null) {
            b.target(target);
        }
        try {
            SafetyProfile a = SafetyProfiler.profile(replaced, PROFILE_KELVIN);
            SafetyProfile z = SafetyProfiler.profile(replacement, PROFILE_KELVIN);
            b.section(Evidence.Sections.SAFETY, SafetyEvidence.section(a, z));
            // one profile, one set of values: the liquids carry the profile's flash point too
            b.flashPoints(a.flashPoint().celsius(), basis(a), z.flashPoint().celsius(), basis(z));
            b.cautions(SafetyEvidence.cautions(a, z));
        } catch (IllegalArgumentException | IllegalStateException e) {
            b.section(Evidence.Sections.SAFETY, CanonicalJson.object().put("note", "no safety profile: " + e.getMessage()));
        }
        if (target != null) {
            // each liquid's path on its own: one that cannot be dried (no vapour pressure) leaves a note in its own
            // series and never costs the other its path
            DryingPath a = null;
            DryingPath z = null;
            String whyNotA = null;
            String whyNotZ = null;
            try {
                a = DryingSimulator.simulate(DryingRequest.of(replaced, target.sphere()));
            } catch (IllegalArgumentException | IllegalStateException e) {
                whyNotA = e.getMessage();
            }
            try {
                z = DryingSimulator.simulate(DryingRequest.of(replacement, target.sphere()));
            } catch (IllegalArgumentException | IllegalStateException e) {
                whyNotZ = e.getMessage();
            }
            if (a == null && z == null) {
                b.section(Evidence.Sections.DRYING, CanonicalJson.object().put("note", "no drying path: " + Evidence.Sections.REPLACED + ": "
                        + whyNotA + "; " + Evidence.Sections.REPLACEMENT + ": " + whyNotZ));
            } else {
                b.section(Evidence.Sections.DRYING, DryingEvidence.section(a, z, whyNotA, whyNotZ, replaced.describe(), replacement.describe(),
                        DryingRequest.DEFAULT_KELVIN - 273.15));
            }
        } else {
            b.section(Evidence.Sections.DRYING, CanonicalJson.object()
                    .put("note", "No drying path: it is followed as RED to a target, and no target was given."));
        }
        try {
            b.section(Evidence.Sections.RANKING, RankingEvidence.section(replaced, replacement, target));
        } catch (IllegalArgumentException | IllegalStateException e) {
            b.section(Evidence.Sections.RANKING, CanonicalJson.object().put("note", "no ranking terms: " + e.getMessage()));
        }
        return b.build();
    }
}
