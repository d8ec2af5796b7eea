package org.cohesa.core.coverage;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import org.cohesa.core.drying.EvaporationRates;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfile.FlashPointStatus;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.VapourPressure;

/**
 * The coverage of a solvent library: per property how many solvents have a value and what the values rest on
 * ({@link Provenance}), how many vapour pressures at 25 °C are extrapolated or estimated, and how many of the
 * Hansen-bearing solvents can be dried and flash-point-checked in a blend.
 *
 * @param solvents                number of solvents
 * @param properties              one line per property group, in the order of the CSV source columns
 * @param vapourPressureAt25C     of the stored or run-time vapour pressures at 25 °C: how many rest on a correlation
 *                                inside its range, an extrapolation, or an estimate
 * @param workflows               drying and blend-flash-point readiness of the Hansen-bearing solvents
 */
public record LibraryCoverage(int solvents, List<PropertyCoverage> properties, Map<String, Integer> vapourPressureAt25C,
        WorkflowCoverage workflows) {

    /** 25 °C, K: where drying and the vapour-hazard ratio are computed by default. */
    public static final double ROOM_K = 298.15;

    public LibraryCoverage {
        properties = List.copyOf(properties);
        vapourPressureAt25C = Map.copyOf(vapourPressureAt25C);
    }

    private record Group(String key, String label, Predicate<Solvent> has) {
    }

    /** Property groups as in {@code SOURCE_GROUPS} of the store, with their value test. */
    private static final List<Group> GROUPS = List.of(
            new Group("identity", "identity (CAS)", s -> s.cas() != null),
            new Group("smiles", "structure (SMILES)", s -> s.smiles() != null),
            new Group("molar_mass", "molar mass", s -> s.molarMass() != null),
            new Group("density", "density", s -> s.density() != null),
            new Group("hsp", "Hansen parameters", Solvent::hasHansen),
            new Group("boiling_point", "boiling point", s -> s.boilingPointC() != null),
            new Group("melting_point", "melting point", s -> s.meltingPointC() != null),
            new Group("flash_point", "flash point", s -> s.flashPointC() != null),
            new Group("autoignition", "autoignition temperature", s -> s.fire().autoignitionC() != null),
            new Group("flammability_limits", "flammability limits", s -> s.fire().lflPct() != null),
            new Group("vapour_pressure", "vapour pressure", s -> s.vapourPressure() != null),
            new Group("hvap", "enthalpy of vaporisation", s -> s.hvapKjPerMol() != null),
            new Group("oel", "exposure limit", s -> s.exposure().isKnown()),
            new Group("hazard_statements", "hazard statements", s -> !s.hazardStatements().isEmpty()),
            new Group("peroxide_former", "peroxide former", Solvent::peroxideFormer),
            new Group("ich", "ICH Q3C class", s -> s.ichClass() != null),
            new Group("unifac", "UNIFAC groups", s -> !s.unifac().isEmpty()));

    /**
     * @param library  the solvents
     * @param partner  the second component of the 50/50 test blend for the flash-point check (a solvent with a flash
     *                 point and a vapour pressure, e.g. n-butyl acetate); for the partner itself another library solvent
     *                 with both is used
     */
    public static LibraryCoverage of(List<Solvent> library, Solvent partner) {
        List<PropertyCoverage> props = new ArrayList<>();
        for (Group g : GROUPS) {
            int[] n = new int[Provenance.values().length];
            int have = 0;
            for (Solvent s : library) {
                if (!g.has().test(s)) {
                    continue;
                }
                have++;
                n[Provenance.of(s.sources().get(g.key()), s.userEntry()).ordinal()]++;
            }
            props.add(new PropertyCoverage(g.key(), g.label(), library.size(), have, n[Provenance.MEASURED.ordinal()],
                    n[Provenance.ESTIMATED.ordinal()], n[Provenance.RECALLED.ordinal()], n[Provenance.DERIVED.ordinal()],
                    n[Provenance.USER.ordinal()], n[Provenance.UNSOURCED.ordinal()]));
        }
        Map<String, Integer> at25 = new LinkedHashMap<>();
        for (VapourPressure.Kind k : VapourPressure.Kind.values()) {
            at25.put(k.name().toLowerCase(java.util.Locale.ROOT), 0);
        }
        at25.put("none", 0);
        for (Solvent s : library) {
            String kind = VapourPressure.of(s).map(vp -> vp.methodAt(ROOM_K).kind().name().toLowerCase(java.util.Locale.ROOT)).orElse("none");
            at25.merge(kind, 1, Integer::sum);
        }
        return new LibraryCoverage(library.size(), props, at25, workflows(library, partner));
    }

    private static WorkflowCoverage workflows(List<Solvent> library, Solvent partner) {
        Solvent other = library.stream().filter(s -> !s.name().equals(partner.name()) && s.flashPointC() != null && s.vapourPressure() != null
                && !s.vapourPressure().isEstimate()).findFirst().orElse(partner);
        int hansen = 0;
        int dry = 0;
        int flash = 0;
        List<String> notDrying = new ArrayList<>();
        List<String> notFlash = new ArrayList<>();
        for (Solvent s : library) {
            if (!s.hasHansen()) {
                continue;
            }
            hansen++;
            try {
                EvaporationRates.of(List.of(s), ROOM_K);
                dry++;
            } catch (RuntimeException e) {
                notDrying.add(s.name() + ": " + e.getMessage());
            }
            Solvent second = s.name().equals(partner.name()) ? other : partner;
            String why = flashPointProblem(s, second);
            if (why == null) {
                flash++;
            } else {
                notFlash.add(s.name() + ": " + why);
            }
        }
        return new WorkflowCoverage(hansen, dry, flash, partner.name(), notDrying, notFlash);
    }

    /** Null when the 50/50 blend of {@code s} with {@code second} gets a flash point verdict on data, else why not. */
    private static String flashPointProblem(Solvent s, Solvent second) {
        try {
            Blend b = new Blend(List.of(new BlendComponent(s, 0.5), new BlendComponent(second, 0.5)));
            SafetyProfile.FlashPoint fp = SafetyProfiler.profile(b, ROOM_K).flashPoint();
            if (fp.status() == FlashPointStatus.UNKNOWN) {
                return fp.detail().isEmpty() ? "could not be estimated" : String.join("; ", fp.detail());
            }
            return null;
        } catch (RuntimeException e) {
            return e.getMessage();
        }
    }
}
