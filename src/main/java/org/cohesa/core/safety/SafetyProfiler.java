package org.cohesa.core.safety;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.activity.ActivityModel;
import org.cohesa.core.activity.ActivityModels;
import org.cohesa.core.activity.CoexistingLiquids;
import org.cohesa.core.activity.CoexistingLiquidsMulti;
import org.cohesa.core.activity.Composition;
import org.cohesa.core.safety.SafetyProfile.FlashPoint;
import org.cohesa.core.safety.SafetyProfile.FlashPointStatus;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.VapourPressure;

/**
 * Builds the {@link SafetyProfile} of a solvent or blend: flash point (library value for a pure liquid,
 * {@link BlendFlashPoint} for a blend), initial boiling point, GHS category and packing group
 * ({@link FlammableLiquidClass}), hazard statements, CMR/aspiration/peroxide flags, saturated-vapour exposure
 * ({@link VapourExposure}), ICH Q3C(R8) ({@link IchQ3c}) and the CHEM21 ranking ({@link SolventGuide}).
 *
 * <p>The activity model is {@link ActivityModels#choose} (UNIFAC, else Hansen–Flory–Huggins). It never falls
 * back to the ideal solution on its own: when no model can describe a blend, its flash point is reported as
 * unknown with the reason; the ideal solution is used only when the caller asks for it, and is then named.
 */
public final class SafetyProfiler {

    /** Temperatures accepted for the exposure estimate, K (−100 °C to 300 °C). */
    static final double MIN_K = 173.15;
    static final double MAX_K = 573.15;

    private static final String FLASH_METHOD = "Liaw et al. 2002 (Le Chatelier's rule with vapour-liquid equilibrium)";

    private SafetyProfiler() {
    }

    /** The profile at {@code kelvin} with the chosen (non-ideal) activity model. */
    public static SafetyProfile profile(Blend blend, double kelvin) {
        return profile(blend, kelvin, false);
    }

    /**
     * @param blend  the liquid (a pure solvent is a one-component blend)
     * @param kelvin temperature for the exposure estimate, K
     * @param ideal  true to use the ideal solution (γ = 1) on purpose; the profile names it
     * @throws InvalidInputException when the temperature is outside −100…300 °C
     */
    public static SafetyProfile profile(Blend blend, double kelvin, boolean ideal) {
        if (!Double.isFinite(kelvin) || kelvin < MIN_K || kelvin > MAX_K) {
            throw new InvalidInputException("temperature", String.format(Locale.ROOT, "%.2f °C", kelvin - 273.15),
                    "must lie between -100 and 300 °C");
        }
        List<Solvent> solvents = blend.solvents();
        double[] phi = blend.fractions();
        int n = solvents.size();
        List<String> names = solvents.stream().map(Solvent::name).toList();
        List<String> cas = solvents.stream().map(Solvent::cas).toList();
        List<VapourPressure> psat = solvents.stream().map(s -> VapourPressure.of(s).orElse(null)).toList();
        List<ExposureLimit> limits = solvents.stream().map(Solvent::exposure).toList();

        double[] x = null;
        String compositionProblem = null;
        if (n == 1) {
            x = new double[] {1.0};
        } else {
            try {
                x = Composition.moleFractions(phi, Composition.molarVolumes(solvents));
            } catch (IllegalArgumentException e) {
                compositionProblem = e.getMessage();
            }
        }

        ActivityModel model = null;
        String modelProblem = null;
        if (n == 1) {
            model = new PureLiquid();
        } else {
            try {
                model = ActivityModels.choose(solvents, ideal);
                if (n == 2 && !ideal) {
                    // inside the model's own miscibility gap the vapour is that of the coexisting layers
                    model = new CoexistingLiquids(model);
                } else if (n > 2 && !ideal && x != null && CoexistingLiquidsMulti.splitsNear(model, x)) {
                    model = new CoexistingLiquidsMulti(model);
                }
            } catch (IllegalArgumentException e) {
                modelProblem = e.getMessage();
            }
        }
        String modelName = model == null ? null : model.name() + (model.note() == null || model.note().isBlank() ? "" : " (" + model.note() + ")");

        List<SafetyProfile.ComponentInfo> infos = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Solvent s = solvents.get(i);
            infos.add(new SafetyProfile.ComponentInfo(s.name(), s.cas(), phi[i], x == null ? null : x[i], s.flashPointC(), s.boilingPointC()));
        }

        FlashPoint flash;
        Double ibp;
        String ibpBasis;
        if (n == 1) {
            flash = pureFlashPoint(solvents.get(0));
            Solvent s = solvents.get(0);
            if (s.boilingPointC() != null) {
                ibp = s.boilingPointC();
                ibpBasis = "normal boiling point from the library";
            } else if (s.vapourPressure() != null && !s.vapourPressure().isEstimate()
                    && s.vapourPressure().isValidAt(s.vapourPressure().temperatureAtPressure(VapourLiquid.ATMOSPHERE_PA), 5)) {
                ibp = s.vapourPressure().temperatureAtPressure(VapourLiquid.ATMOSPHERE_PA) - 273.15;
                ibpBasis = "temperature where the vapour pressure (" + s.vapourPressure().equationName() + ") reaches 101.325 kPa";
            } else {
                ibp = null;
                ibpBasis = "unknown: no boiling point or usable vapour-pressure equation in the library";
            }
        } else {
            String why = compositionProblem != null ? compositionProblem : modelProblem;
            BlendFlashPoint.Result r = null;
            if (why == null) {
                flash = null;
                String unknownFlammable = unknownFlammable(solvents, phi);
                if (unknownFlammable != null) {
                    why = unknownFlammable;
                } else {
                    try {
                        r = BlendFlashPoint.solve(names, x, psat, flashPointsK(solvents), model);
                    } catch (IllegalArgumentException e) {
                        why = e.getMessage();
                    }
                }
            }
            if (r == null) {
                flash = new FlashPoint(null, FlashPointStatus.UNKNOWN, FLASH_METHOD, List.of("not estimated: " + why));
                ibp = null;
                ibpBasis = "unknown: " + why;
                if (why != null && x != null && model != null && psat.stream().allMatch(a -> a != null)) {
                    double bubble = VapourLiquid.bubblePointK(x, psat, model, VapourLiquid.ATMOSPHERE_PA);
                    if (Double.isFinite(bubble)) {
                        ibp = bubble - 273.15;
                        ibpBasis = bubbleBasis(modelName);
                    }
                }
            } else {
                List<String> notes = new ArrayList<>(r.notes());
                List<String> inert = new ArrayList<>();
                for (int i = 0; i < n; i++) {
                    if (solvents.get(i).flashPointC() == null && phi[i] > 0) {
                        inert.add(names.get(i));
                    }
                }
                if (!inert.isEmpty()) {
                    notes.add("treated as non-flammable (no flash point in the library and no flammable-liquid H-statement): " + String.join(", ", inert));
                }
                if (r.hasFlashPoint() && model instanceof CoexistingLiquids two) {
                    java.util.Optional<org.cohesa.core.activity.BinaryLle.Phases> layers = two.splitAt(x, r.kelvin());
                    if (layers.isPresent()) {
                        notes.add(String.format(java.util.Locale.ROOT,
                                "two liquid layers predicted at the flash point (%s: %s mole fraction %.3g and %.3g): the vapour is that over the"
                                        + " coexisting layers, so the estimate is the same throughout the gap (Liaw et al. 2008)",
                                two.name(), names.get(0), layers.get().x1Lean(), layers.get().x1Rich()));
                    }
                }
                if (r.hasFlashPoint() && model instanceof CoexistingLiquidsMulti multi && multi.splitAt(x, r.kelvin()).isPresent()) {
                    notes.add("two liquid layers predicted at the flash point (" + multi.name()
                            + "): the vapour is that over the coexisting layers, found by a liquid-liquid flash");
                }
                String m = FLASH_METHOD + ", activity model: " + modelName;
                if (r.hasFlashPoint()) {
                    flash = new FlashPoint(r.kelvin() - 273.15, FlashPointStatus.COMPUTED, m, notes);
                } else if (inert.size() == n) {
                    flash = new FlashPoint(null, FlashPointStatus.NOT_FLAMMABLE, m, notes);
                } else {
                    notes.add("the flammable vapour does not reach its limit below the bubble point");
                    flash = new FlashPoint(null, FlashPointStatus.NONE_BELOW_BOILING, m, notes);
                }
                if (Double.isFinite(r.bubblePointK())) {
                    ibp = r.bubblePointK() - 273.15;
                    ibpBasis = bubbleBasis(modelName);
                } else {
                    ibp = null;
                    ibpBasis = "unknown: a component lacks vapour-pressure data";
                }
            }
        }

        FlammableLiquidClass.GhsCategory ghs;
        String pg;
        Integer labelled = n == 1 ? labelledCategory(solvents.get(0)) : null;
        if (flash.status() == FlashPointStatus.UNKNOWN && labelled != null) {
            // the supplier's classification stands in for the missing flash point (H224 → 1, H225 → 2, H226 → 3)
            ghs = new FlammableLiquidClass.GhsCategory(labelled, "from the solvent's hazard statement (no flash point in the library)");
            pg = labelled == 1 ? "I" : labelled == 2 ? "II" : "III";
        } else if (flash.status() == FlashPointStatus.UNKNOWN) {
            ghs = new FlammableLiquidClass.GhsCategory(null, "not decidable: the flash point is unknown");
            pg = null;
        } else {
            ghs = FlammableLiquidClass.ghs(flash.celsius(), ibp);
            pg = FlammableLiquidClass.packingGroup(flash.celsius(), ibp);
        }

        VapourExposure.Result exposure;
        if (x == null || model == null) {
            String why = compositionProblem != null ? compositionProblem : modelProblem;
            List<VapourExposure.Component> cs = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                ExposureLimit l = limits.get(i);
                cs.add(new VapourExposure.Component(names.get(i), null, null, null, l.twaPpm(), l.stelPpm(), l.jurisdiction(), l.skin(), null,
                        "not estimated: " + why));
            }
            exposure = new VapourExposure.Result(0, false, cs, List.of("exposure not estimated: " + why));
        } else {
            exposure = VapourExposure.compute(names, cas, x, psat, limits, model, kelvin);
        }

        List<SafetyProfile.HazardLine> hazards = hazardLines(blend);
        List<SafetyProfile.CmrEntry> cmr = new ArrayList<>();
        List<String> aspiration = new ArrayList<>();
        List<String> peroxide = new ArrayList<>();
        List<SafetyProfile.IchLine> ich = new ArrayList<>();
        List<SafetyProfile.GuideLine> guide = new ArrayList<>();
        GuideRank worst = GuideRank.RECOMMENDED;
        for (BlendComponent c : blend.components()) {
            Solvent s = c.solvent();
            double pct = c.fraction() * 100;
            for (String h : s.hazardStatements()) {
                if (HazardStatements.isCarcinogen(h)) {
                    cmr.add(new SafetyProfile.CmrEntry(s.name(), "carcinogen", h, HazardStatements.cmrCategory(h), pct));
                } else if (HazardStatements.isMutagen(h)) {
                    cmr.add(new SafetyProfile.CmrEntry(s.name(), "mutagen", h, HazardStatements.cmrCategory(h), pct));
                } else if (HazardStatements.isReproductiveToxicant(h)) {
                    cmr.add(new SafetyProfile.CmrEntry(s.name(), "reproductive toxicant", h, HazardStatements.cmrCategory(h), pct));
                } else if (HazardStatements.isAspirationHazard(h) && !aspiration.contains(s.name())) {
                    aspiration.add(s.name());
                }
            }
            if ((s.peroxideFormer() || s.hazardStatements().stream().anyMatch(h -> h.equalsIgnoreCase("EUH019"))) && !peroxide.contains(s.name())) {
                peroxide.add(s.name());
            }
            ich.add(new SafetyProfile.IchLine(s.name(), s.cas(), IchQ3c.byCas(s.cas()).orElse(null)));
            SolventGuide.Scores sc = SolventGuide.score(s);
            guide.add(new SafetyProfile.GuideLine(s.name(), sc));
            if (c.fraction() > 0) {
                worst = worst.worse(sc.rank());
            }
        }
        return new SafetyProfile(blend, kelvin - 273.15, infos, flash, ibp, ibpBasis, ghs, pg, hazards, cmr, aspiration, peroxide,
                exposure, modelName, ich, guide, worst);
    }

    private static String bubbleBasis(String modelName) {
        return "bubble point at 101.325 kPa (modified Raoult's law, library vapour pressures, activity model: " + modelName + ")";
    }

    private static FlashPoint pureFlashPoint(Solvent s) {
        String src = s.sources().get("flash_point");
        if (s.flashPointC() != null) {
            return new FlashPoint(s.flashPointC(), FlashPointStatus.LIBRARY, "library value" + (src == null ? "" : " (" + src + ")"), List.of());
        }
        if (flammableByStatement(s)) {
            return new FlashPoint(null, FlashPointStatus.UNKNOWN, "library value",
                    List.of("not estimated: " + s.name() + " carries a flammable-liquid statement but the library has no flash point"));
        }
        return new FlashPoint(null, FlashPointStatus.NOT_FLAMMABLE, "library value",
                List.of("no flash point in the library and no flammable-liquid H-statement: treated as not flammable; check the SDS"));
    }

    /**
     * The GHS flammable-liquid category the solvent's own hazard statements declare (H224 → 1, H225 → 2, H226 → 3,
     * H227 → 4; GHS Rev. 10 Table 2.6.1 with Annex 3), or null when none is present.
     */
    public static Integer labelledCategory(Solvent s) {
        Integer best = null;
        for (String h : s.hazardStatements()) {
            Integer c = switch (HazardStatements.family(h)) {
                case "H224" -> 1;
                case "H225" -> 2;
                case "H226" -> 3;
                case "H227" -> 4;
                default -> null;
            };
            if (c != null && (best == null || c < best)) {
                best = c;
            }
        }
        return best;
    }

    private static boolean flammableByStatement(Solvent s) {
        return s.hazardStatements().stream().anyMatch(h -> h.startsWith("H224") || h.startsWith("H225") || h.startsWith("H226")
                || h.startsWith("H227"));
    }

    /** A component that is flammable by its H-statement but has no flash point makes the blend's flash point unknowable. */
    private static String unknownFlammable(List<Solvent> solvents, double[] phi) {
        for (int i = 0; i < solvents.size(); i++) {
            Solvent s = solvents.get(i);
            if (phi[i] > 0 && s.flashPointC() == null && flammableByStatement(s)) {
                return s.name() + " carries a flammable-liquid statement but the library has no flash point for it";
            }
        }
        return null;
    }

    private static List<Double> flashPointsK(List<Solvent> solvents) {
        List<Double> out = new ArrayList<>();
        for (Solvent s : solvents) {
            out.add(s.flashPointC() == null ? null : s.flashPointC() + 273.15);
        }
        return out;
    }

    private static List<SafetyProfile.HazardLine> hazardLines(Blend blend) {
        Map<String, List<SafetyProfile.Carrier>> by = new LinkedHashMap<>();
        for (BlendComponent c : blend.components()) {
            for (String h : c.solvent().hazardStatements()) {
                by.computeIfAbsent(h, k -> new ArrayList<>()).add(new SafetyProfile.Carrier(c.solvent().name(), c.fraction() * 100));
            }
        }
        List<SafetyProfile.HazardLine> out = new ArrayList<>();
        by.entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> out.add(new SafetyProfile.HazardLine(e.getKey(), HazardStatements.textOrNote(e.getKey()), e.getValue())));
        return out;
    }

    /** γ = 1 exactly: a one-component liquid is its own standard state (not an approximation). */
    private static final class PureLiquid implements ActivityModel {
        @Override
        public String name() {
            return "pure liquid (γ = 1)";
        }

        @Override
        public double[] gamma(double[] moleFractions, double kelvin) {
            return new double[] {1.0};
        }

        @Override
        public int size() {
            return 1;
        }
    }
}
