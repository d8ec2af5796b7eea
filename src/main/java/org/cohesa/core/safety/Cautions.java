package org.cohesa.core.safety;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Predicate;
import org.cohesa.core.safety.SafetyProfile.FlashPointStatus;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * Plain-language cautions for a {@link SafetyProfile}, in our own words, most severe first. The list always
 * ends with {@link #REMINDER}. The blend designer, the records and the reports show these beside each result.
 */
public final class Cautions {

    /** The closing sentence of every caution list. */
    public static final String REMINDER = "These results are screening estimates: the supplier's SDS, local codes and the site's "
            + "licensed safety professionals decide. Test every blend in the lab before use.";

    /** Vapour hazard ratio above which the saturated vapour is called very high (our threshold, common practice, no source). */
    static final double VERY_HIGH_VAPOUR = 100;

    private Cautions() {
    }

    public static List<String> forProfile(SafetyProfile p) {
        List<String> out = new ArrayList<>();
        flammability(p, out);
        labelAgreement(p, out);
        cmr(p, out);
        statement(p, out, c -> c.startsWith("H300") || c.startsWith("H310") || c.startsWith("H330"),
                "%s %s able to kill in small amounts (swallowed, on the skin or inhaled, see its statements): closed handling and the SDS's protective measures are required.");
        statement(p, out, c -> c.startsWith("H301") || c.startsWith("H311") || c.startsWith("H331") || c.startsWith("H370") || c.startsWith("H372"),
                "%s %s toxic or organ-damaging: keep exposure as low as possible, never rely on smell as a warning.");
        if (!p.aspirationHazards().isEmpty()) {
            out.add(join(p.aspirationHazards()) + " can be fatal if swallowed and drawn into the lungs (H304): never pipette or siphon by mouth; "
                    + "if swallowed, do not induce vomiting and get medical help.");
        }
        if (!p.peroxideFormers().isEmpty()) {
            out.add(join(p.peroxideFormers()) + " can form explosive peroxides on storage: date the containers when opened, keep them closed "
                    + "and away from light, and test for peroxides before distilling or evaporating to dryness.");
        }
        statement(p, out, c -> c.startsWith("H314") || c.startsWith("H318"),
                "%s %s corrosive to skin or seriously damaging to eyes: wear eye protection and suitable gloves.");
        exposure(p, out);
        skin(p, out);
        ich(p, out);
        statement(p, out, c -> c.startsWith("H400") || c.startsWith("H410") || c.startsWith("H411"),
                "%s %s toxic to aquatic life: keep it out of drains and collect waste for licensed disposal.");
        statement(p, out, c -> c.startsWith("H420"), "%s %s harmful to stratospheric ozone: its use is restricted in many jurisdictions.");
        if (!p.isPure()) {
            out.add("Blend values assume one well-mixed liquid phase; if the blend separates, each layer behaves differently and must be assessed on its own.");
        }
        out.add(REMINDER);
        return out.stream().map(Cautions::capitalise).toList();
    }

    private static void flammability(SafetyProfile p, List<String> out) {
        SafetyProfile.FlashPoint fp = p.flashPoint();
        String what = p.isPure() ? p.blend().components().get(0).solvent().name() : "The blend";
        switch (fp.status()) {
            case LIBRARY, COMPUTED -> {
                String est = fp.status() == FlashPointStatus.COMPUTED ? "estimated flash point" : "flash point";
                double c = fp.celsius();
                Integer cat = p.ghs().category();
                String pg = p.packingGroup() == null ? "" : ", UN packing group " + p.packingGroup();
                if (c < 23) {
                    out.add(String.format(Locale.ROOT, "%s is highly flammable: %s %.0f °C (GHS Category %s%s). It gives ignitable vapour at room temperature: "
                            + "no open flames or sparks, earth and bond containers, use ventilation and equipment rated for the hazardous area.",
                            what, est, c, cat == null ? "?" : cat, pg));
                } else if (c <= 60) {
                    out.add(String.format(Locale.ROOT, "%s is flammable: %s %.0f °C (GHS Category 3%s). Warm rooms, heating or spraying create ignitable vapour.",
                            what, est, c, pg));
                } else {
                    out.add(String.format(Locale.ROOT, "%s is combustible: %s %.0f °C%s. It burns once heated above that temperature or sprayed as a mist.",
                            what, est, c, cat == null ? "" : " (GHS Category 4; not a CLP class)"));
                }
                if (fp.status() == FlashPointStatus.COMPUTED) {
                    out.add("The blend flash point is a model estimate (" + fp.model() + "); measure it (closed cup) before using it for classification.");
                }
            }
            case NONE_BELOW_BOILING -> out.add(what + " shows no flash point below its boiling point in the model, but it contains flammable liquids: "
                    + "its vapour can still burn when it is heated, boiled or sprayed. Measure the flash point before treating it as non-flammable.");
            case UNKNOWN -> out.add(what + ": the flash point could not be estimated (" + String.join("; ", fp.detail()) + "). "
                    + (p.isPure() && p.ghs().category() != null
                            ? "Its hazard statements declare GHS Category " + p.ghs().category() + "; handle it accordingly."
                            : "Treat it as at least as flammable as its most flammable component."));
            case NOT_FLAMMABLE -> {
                if (!p.isPure() || !"7732-18-5".equals(p.components().get(0).cas())) {
                    out.add(what + " has no flash point in our data; that is not proof it cannot burn or decompose in a fire — check the SDS.");
                }
            }
            default -> {
            }
        }
    }

    /** A pure solvent whose own hazard statement disagrees with the category its flash point gives: the stricter holds. */
    private static void labelAgreement(SafetyProfile p, List<String> out) {
        if (!p.isPure() || p.flashPoint().status() != FlashPointStatus.LIBRARY) {
            return;
        }
        Solvent s = p.blend().components().get(0).solvent();
        Integer labelled = SafetyProfiler.labelledCategory(s);
        Integer computed = p.ghs().category();
        if (labelled != null && !labelled.equals(computed)) {
            out.add(String.format(Locale.ROOT, "%s: its hazard statements declare GHS Category %d, its library flash point gives %s. "
                    + "Different test methods give different flash points; apply the stricter category until the supplier's SDS settles it.",
                    s.name(), labelled, computed == null ? "no category" : "Category " + computed));
        }
    }

    private static void cmr(SafetyProfile p, List<String> out) {
        for (SafetyProfile.CmrEntry e : p.cmr()) {
            String share = p.isPure() ? "" : String.format(Locale.ROOT, " (%.0f %% by volume)", e.volumePercent());
            String sentence = switch (e.effect()) {
                case "carcinogen" -> e.category().equals("1") ? "may cause cancer" : "is suspected of causing cancer";
                case "mutagen" -> e.category().equals("1") ? "may cause genetic defects" : "is suspected of causing genetic defects";
                default -> e.category().equals("1") ? "may damage fertility or the unborn child"
                        : e.category().equals("2") ? "is suspected of damaging fertility or the unborn child" : "may harm breast-fed children";
            };
            String advice = e.effect().equals("reproductive toxicant")
                    ? " People who are or may become pregnant, or are breast-feeding, must not be exposed; look for a substitute first."
                    : " Avoid all exposure, use closed systems and look for a substitute first.";
            out.add(e.component() + share + " " + sentence + " (" + e.code() + ")." + advice);
        }
    }

    private static void exposure(SafetyProfile p, List<String> out) {
        VapourExposure.Result ex = p.exposure();
        double r = ex.index();
        String label = p.isPure() ? "The saturated vapour" : "The equilibrium vapour of the blend";
        if (r > 1) {
            out.add(String.format(Locale.ROOT, "%s at %.0f °C is %s times the occupational exposure limit (%s): %s",
                    label, p.temperatureC(), r >= 10 ? String.format(Locale.ROOT, "%.0f", r) : String.format(Locale.ROOT, "%.1f", r),
                    p.isPure() ? "vapour hazard ratio" : "mixture exposure index",
                    r > VERY_HIGH_VAPOUR ? "work only in closed systems or with local exhaust ventilation; open handling is not acceptable."
                            : "use local exhaust ventilation and keep containers closed."));
        }
        // say exactly what is missing: a solvent with a vapour pressure but no limit is a different gap from one
        // with a limit but no vapour pressure
        Set<String> noLimit = new LinkedHashSet<>();
        Set<String> noVapour = new LinkedHashSet<>();
        for (VapourExposure.Component c : ex.components()) {
            if (c.status().equals("no limit known")) {
                noLimit.add(c.name());
            } else if (!c.status().equals("counted") && !c.status().startsWith("water")) {
                noVapour.add(c.name());
            }
        }
        if (!noLimit.isEmpty()) {
            out.add("No occupational exposure limit is known to us for " + join(List.copyOf(noLimit))
                    + ": that is not a sign of safety, and the exposure index leaves " + (noLimit.size() == 1 ? "it" : "them")
                    + " out; ask the supplier or your occupational hygienist for an in-house limit.");
        }
        if (!noVapour.isEmpty()) {
            out.add("No vapour pressure is known to us for " + join(List.copyOf(noVapour))
                    + ": the exposure index leaves " + (noVapour.size() == 1 ? "it" : "them") + " out, which is not a sign of safety.");
        }
    }

    private static void skin(SafetyProfile p, List<String> out) {
        List<String> skin = new ArrayList<>();
        for (VapourExposure.Component c : p.exposure().components()) {
            if (c.skin()) {
                skin.add(c.name());
            }
        }
        if (!skin.isEmpty()) {
            out.add(join(skin) + (skin.size() == 1 ? " passes" : " pass") + " through the skin (skin notation): wear gloves rated for it; the air limit alone does not protect.");
        }
    }

    private static void ich(SafetyProfile p, List<String> out) {
        for (SafetyProfile.IchLine l : p.ich()) {
            if (l.entry() == null) {
                continue;
            }
            if (l.entry().solventClass() == 1) {
                out.add(l.component() + " is an ICH Q3C Class 1 solvent: avoid it in the manufacture of drug substances, excipients and products"
                        + " (limit " + fmt(l.entry().limitPpm()) + " ppm where unavoidable).");
            } else if (l.entry().solventClass() == 2) {
                out.add(l.component() + " is an ICH Q3C Class 2 solvent: residues are limited (PDE " + fmt(l.entry().pdeMgPerDay())
                        + " mg/day, Option 1 " + fmt(l.entry().limitPpm()) + " ppm).");
            }
        }
    }

    private static void statement(SafetyProfile p, List<String> out, Predicate<String> code, String template) {
        List<String> carriers = new ArrayList<>();
        for (BlendComponent c : p.blend().components()) {
            Solvent s = c.solvent();
            if (s.hazardStatements().stream().anyMatch(code)) {
                carriers.add(s.name());
            }
        }
        if (!carriers.isEmpty()) {
            out.add(String.format(Locale.ROOT, template, join(carriers), carriers.size() == 1 ? "is" : "are"));
        }
    }

    /** Sentences start with a capital even when a solvent name does not ("n-hexane" stays as written inside). */
    private static String capitalise(String s) {
        return s.isEmpty() || !Character.isLowerCase(s.charAt(0)) || s.length() > 1 && s.charAt(1) == '-' ? s
                : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static String join(List<String> names) {
        if (names.size() == 1) {
            return names.get(0);
        }
        return String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
    }

    private static String fmt(Double d) {
        if (d == null) {
            return "-";
        }
        return d == Math.rint(d) ? String.format(Locale.ROOT, "%.0f", d) : String.format(Locale.ROOT, "%.1f", d);
    }
}
