package org.cohesa.core.structure;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.cohesa.core.InvalidInputException;

/**
 * Estimated against published Hansen parameters: the experimental column of Alshehri et al., AIChE J. 68 (2022)
 * e17469 ({@code alshehri-hansen-solubility-parameters.tsv}, Pa^½), joined by CAS to the PubChem SMILES of the
 * identifiers table. Property-route inputs by CAS: CRC ΔHvap(298 K), CRC density (physical constants), CRC
 * refractive index (organic RI table, else physical constants), Poling dipole moments.
 */
final class HansenValidation {

    /** Absolute errors of one component, MPa^½, with the family of each compound. */
    static final class Errors {
        final List<Double> all = new ArrayList<>();
        final Map<String, List<Double>> byFamily = new TreeMap<>();

        void add(String family, double error) {
            all.add(Math.abs(error));
            byFamily.computeIfAbsent(family, k -> new ArrayList<>()).add(Math.abs(error));
        }

        double mae() {
            return mae(all);
        }

        double p90() {
            return p90(all);
        }

        static double mae(List<Double> e) {
            return e.stream().mapToDouble(Double::doubleValue).average().orElse(Double.NaN);
        }

        static double p90(List<Double> e) {
            if (e.isEmpty()) {
                return Double.NaN;
            }
            List<Double> s = new ArrayList<>(e);
            s.sort(null);
            return s.get((int) Math.ceil(0.9 * s.size()) - 1);
        }
    }

    final Map<String, Errors> errors = new TreeMap<>();
    int joined;
    int refused;
    int uncovered;
    /** Compounds the Stefanis–Panayiotou tables cover completely, and those both group methods cover. */
    int spCovered;
    int bothCovered;
    /** Per-compound S–P misses, reason → count (first reason of each compound). */
    final Map<String, Integer> spMisses = new TreeMap<>();

    Errors of(String key) {
        return errors.computeIfAbsent(key, k -> new Errors());
    }

    static HansenValidation run(Path ref) {
        Map<String, String[]> byCas = ReferenceTables.identifiersBy(ref, 1);
        Map<String, Double> hvap = new HashMap<>();
        for (String[] r : ReferenceTables.tsv(ref, "crc-handbook-heat-of-vaporization.tsv", true)) {
            if (r.length > 5 && !r[5].isBlank()) {
                hvap.put(r[0], Double.parseDouble(r[5]));
            }
        }
        Map<String, Double> rho = new HashMap<>();
        Map<String, Double> ri = new HashMap<>();
        for (String[] r : ReferenceTables.tsv(ref, "physical-constants-of-organic-compounds.csv", true)) {
            if (r.length > 4 && !r[4].isBlank()) {
                rho.put(r[0], Double.parseDouble(r[4]) / 1000);
            }
            if (r.length > 5 && !r[5].isBlank()) {
                ri.put(r[0], Double.parseDouble(r[5]));
            }
        }
        for (String[] r : ReferenceTables.tsv(ref, "crc-handbook-organic-ri.csv", true)) {
            if (!r[1].isBlank()) {
                ri.put(r[0], Double.parseDouble(r[1]));
            }
        }
        Map<String, Double> dipole = new HashMap<>();
        for (String[] r : ReferenceTables.tsv(ref, "poling-dipole.csv", true)) {
            if (r.length > 2 && !r[2].isBlank()) {
                dipole.put(r[0], Double.parseDouble(r[2]));
            }
        }
        HansenValidation v = new HansenValidation();
        for (String[] r : ReferenceTables.tsv(ref, "alshehri-hansen-solubility-parameters.tsv", true)) {
            String[] id = byCas.get(r[0]);
            if (id == null || id[4].isBlank() || r[1].isBlank() || r[2].isBlank() || r[3].isBlank()) {
                continue;
            }
            double[] pub = {Double.parseDouble(r[1]) / 1000, Double.parseDouble(r[2]) / 1000, Double.parseDouble(r[3]) / 1000};
            Structure st;
            try {
                st = StructureParser.parse("smiles", id[4]);
            } catch (InvalidInputException e) {
                v.refused++;
                continue;
            }
            v.joined++;
            String family = StructureFamily.of(st);
            MathieuEstimate m = MathieuMethod.estimate(st);
            if (!m.complete()) {
                v.uncovered++;
            } else {
                v.of("group δD").add(family, m.dD() - pub[0]);
                v.of("group δP").add(family, m.dP() - pub[1]);
                v.of("group δH").add(family, m.dH() - pub[2]);
            }
            StefanisPanayiotouEstimate sp = StefanisPanayiotouMethod.estimate(st);
            if (sp.complete()) {
                v.spCovered++;
                v.of("S–P δD").add(family, sp.dD() - pub[0]);
                v.of("S–P δP").add(family, sp.dP() - pub[1]);
                v.of("S–P δH").add(family, sp.dH() - pub[2]);
            } else {
                v.spMisses.merge(sp.uncovered().get(0).replaceAll("group .*", "group …"), 1, Integer::sum);
            }
            // the split that chooses a combination (dev) and the one that reports it (validation): by the parity of the
            // CAS check digit, which has nothing to do with the chemistry
            String half = (r[0].charAt(r[0].length() - 1) - '0') % 2 == 0 ? "dev" : "validation";
            if (m.complete() && sp.complete()) {
                v.bothCovered++;
                double[] ma = {m.dD(), m.dP(), m.dH()};
                double[] sa = {sp.dD(), sp.dP(), sp.dH()};
                String[] c = {"δD", "δP", "δH"};
                for (int k = 0; k < 3; k++) {
                    for (String set : new String[] {"both", half}) {
                        v.of(set + " Mathieu " + c[k]).add(family, ma[k] - pub[k]);
                        v.of(set + " S–P " + c[k]).add(family, sa[k] - pub[k]);
                        v.of(set + " mean " + c[k]).add(family, (ma[k] + sa[k]) / 2 - pub[k]);
                    }
                }
            }
            // the default route as users get it: per component the mean of both group methods, or the one that covers it
            StructureEstimate est = StructureEstimator.estimate(st, MeasuredProperties.NONE);
            EstimatedValue[] chosen = {est.dD(), est.dP(), est.dH()};
            String[] names = {"δD", "δP", "δH"};
            for (int k = 0; k < 3; k++) {
                if (chosen[k] == null) {
                    continue;
                }
                String route = chosen[k].route();
                String kind = StructureEstimator.GROUP_MEAN.equals(route) ? "mean" : StructureEstimator.GROUP_SP.equals(route) ? "S–P alone" : "Mathieu alone";
                v.of("combined " + names[k]).add(family, chosen[k].value() - pub[k]);
                v.of("combined " + kind + " " + names[k]).add(family, chosen[k].value() - pub[k]);
                if (m.complete()) {
                    // like for like with the Mathieu figures: the compounds Mathieu covers in full
                    v.of("combined on Mathieu's set " + names[k]).add(family, chosen[k].value() - pub[k]);
                }
            }
            String cas = r[0];
            Double density = rho.get(cas);
            if (density == null) {
                continue;
            }
            double vm = st.molarMass() / density;
            if (m.molarVolume() != null) {
                v.of("group V (rel)").add(family, (m.molarVolume() - vm) / vm);
            }
            Double n = ri.get(cas);
            if (n != null) {
                v.of("property δD").add(family, PropertyRoute.dispersionFromRefractiveIndex(n, vm) - pub[0]);
            }
            Double mu = dipole.get(cas);
            if (mu != null) {
                v.of("property δP").add(family, PropertyRoute.polarFromDipole(mu, vm) - pub[1]);
            }
            Double h = hvap.get(cas);
            if (h != null && n != null && mu != null) {
                double dt = PropertyRoute.totalFromVaporisation(h, vm);
                double dd = PropertyRoute.dispersionFromRefractiveIndex(n, vm);
                double dp = PropertyRoute.polarFromDipole(mu, vm);
                v.of("property δH").add(family, PropertyRoute.hydrogenBondingRemainder(dt, dd, dp) - pub[2]);
                if (est.dH() != null) {
                    v.of("like for like δH group").add(family, est.dH().value() - pub[2]);
                    v.of("like for like δH property").add(family, PropertyRoute.hydrogenBondingRemainder(dt, dd, dp) - pub[2]);
                }
            }
            // like for like: the default group route and the property route on the same compounds (those with the
            // measured property and a group value), which decides the route of the bundled estimated sets
            if (n != null && est.dD() != null) {
                double prop = PropertyRoute.dispersionFromRefractiveIndex(n, vm);
                for (String set : new String[] {"like for like", half}) {
                    v.of(set + " δD group").add(family, est.dD().value() - pub[0]);
                    v.of(set + " δD property").add(family, prop - pub[0]);
                }
            }
            if (mu != null && est.dP() != null) {
                double prop = PropertyRoute.polarFromDipole(mu, vm);
                for (String set : new String[] {"like for like", half}) {
                    v.of(set + " δP group").add(family, est.dP().value() - pub[1]);
                    v.of(set + " δP property").add(family, prop - pub[1]);
                }
            }
            if (h != null) {
                double pubTotal = Math.sqrt(pub[0] * pub[0] + pub[1] * pub[1] + pub[2] * pub[2]);
                v.of("property δt").add(family, PropertyRoute.totalFromVaporisation(h, vm) - pubTotal);
            }
        }
        return v;
    }

    String summary() {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "Hansen estimates vs Alshehri 2022 experimental: %d compounds with a SMILES (%d refused by the parser); "
                        + "%d outside the group method's tables; Stefanis–Panayiotou covers %d, both %d%n", joined, refused, uncovered,
                spCovered, bothCovered));
        sb.append("S–P misses: ").append(spMisses).append(System.lineSeparator());
        errors.forEach((k, e) -> {
            sb.append(String.format(Locale.ROOT, "%-16s n=%4d MAE %.2f P90 %.2f%n", k, e.all.size(), e.mae(), e.p90()));
            e.byFamily.forEach((f, l) -> sb.append(String.format(Locale.ROOT, "      %-22s n=%4d MAE %.2f P90 %.2f%n", f, l.size(),
                    Errors.mae(l), Errors.p90(l))));
        });
        return sb.toString();
    }
}
