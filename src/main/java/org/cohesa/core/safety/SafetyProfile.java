package org.cohesa.core.safety;

import java.util.List;
import org.cohesa.core.solvent.Blend;

/**
 * The safety and compliance facts of one solvent or blend at one temperature (immutable). Built by
 * {@link SafetyProfiler}; turned into plain sentences by {@link Cautions}. Temperatures in °C unless named K.
 *
 * @param blend                    the liquid
 * @param temperatureC             temperature of the exposure estimate, °C
 * @param components               per component: fractions, flash point, boiling point
 * @param flashPoint               the flash point and how it was obtained
 * @param initialBoilingPointC     initial boiling point (pure: library or Antoine; blend: bubble point), or null
 * @param initialBoilingPointBasis how the initial boiling point was obtained
 * @param ghs                      GHS Rev. 10 flammable-liquid category
 * @param packingGroup             UN packing group for Class 3, or null (not Class 3)
 * @param hazardStatements         each statement of any component with its text and carriers
 * @param cmr                      carcinogen, mutagen and reproductive-toxicant entries
 * @param aspirationHazards        components with H304
 * @param peroxideFormers          components that form peroxides on storage
 * @param exposure                 saturated-vapour exposure and the mixture exposure index
 * @param activityModel            the activity model used for γ (exposure and, for blends, the flash point)
 * @param ich                      ICH Q3C(R8) entry per component
 * @param guide                    CHEM21 scores per component
 * @param guideRank                the least favourable component rank
 */
public record SafetyProfile(
        Blend blend,
        double temperatureC,
        List<ComponentInfo> components,
        FlashPoint flashPoint,
        Double initialBoilingPointC,
        String initialBoilingPointBasis,
        FlammableLiquidClass.GhsCategory ghs,
        String packingGroup,
        List<HazardLine> hazardStatements,
        List<CmrEntry> cmr,
        List<String> aspirationHazards,
        List<String> peroxideFormers,
        VapourExposure.Result exposure,
        String activityModel,
        List<IchLine> ich,
        List<GuideLine> guide,
        GuideRank guideRank) {

    public SafetyProfile {
        components = List.copyOf(components);
        hazardStatements = List.copyOf(hazardStatements);
        cmr = List.copyOf(cmr);
        aspirationHazards = List.copyOf(aspirationHazards);
        peroxideFormers = List.copyOf(peroxideFormers);
        ich = List.copyOf(ich);
        guide = List.copyOf(guide);
    }

    /** True for a one-component liquid. */
    public boolean isPure() {
        return blend.size() == 1;
    }

    /** The mixture exposure index, which for one liquid is also its vapour hazard ratio (see {@link VapourExposure}). */
    public double vapourHazardRatio() {
        return exposure.index();
    }

    /**
     * @param name                 solvent name
     * @param cas                  CAS number or null
     * @param volumeFraction       φ
     * @param moleFraction         x (null when a molar volume is missing)
     * @param flashPointC          pure-component flash point, or null
     * @param boilingPointC        pure-component boiling point, or null
     */
    public record ComponentInfo(String name, String cas, double volumeFraction, Double moleFraction, Double flashPointC, Double boilingPointC) {
    }

    /** How the flash point came about. */
    public enum FlashPointStatus {
        /** pure liquid: the library value */
        LIBRARY,
        /** blend: computed by {@link BlendFlashPoint} */
        COMPUTED,
        /** no flammable component */
        NOT_FLAMMABLE,
        /** flammable vapour never reaches the limit below the boiling point */
        NONE_BELOW_BOILING,
        /** could not be estimated; {@link FlashPoint#detail()} says why */
        UNKNOWN
    }

    /**
     * @param celsius flash point, °C, or null
     * @param status  how it was obtained
     * @param model   the method and activity model, e.g. "Liaw et al. 2002 (Le Chatelier + VLE) with UNIFAC (original)"
     * @param detail  the reason when unknown, or notes (extrapolations, assumptions)
     */
    public record FlashPoint(Double celsius, FlashPointStatus status, String model, List<String> detail) {
        public FlashPoint {
            detail = List.copyOf(detail);
        }
    }

    /** One carrier of a hazard statement: the component and its volume percentage in the liquid. */
    public record Carrier(String name, double volumePercent) {
    }

    /** A hazard statement with its text and the components that carry it. */
    public record HazardLine(String code, String text, List<Carrier> carriers) {
        public HazardLine {
            carriers = List.copyOf(carriers);
        }
    }

    /**
     * @param component     solvent name
     * @param effect        "carcinogen", "mutagen" or "reproductive toxicant"
     * @param code          the H-statement, e.g. "H360D"
     * @param category      GHS category "1", "2" or "lactation"
     * @param volumePercent share in the liquid
     */
    public record CmrEntry(String component, String effect, String code, String category, double volumePercent) {
    }

    /** ICH Q3C(R8) facts of one component; {@code entry} null when the solvent is not listed. */
    public record IchLine(String component, String cas, IchQ3c.Entry entry) {
    }

    /** CHEM21 scores of one component. */
    public record GuideLine(String component, SolventGuide.Scores scores) {
    }
}
