package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.desktop.common.Numbers;

/**
 * What a candidate card says, as text: the facts a formulator reads first (flash point and GHS category, the worst
 * ICH Q3C class with its meaning, health badges, cost), each unknown said as "unknown" and never left blank.
 */
public final class CandidateFacts {

    /** How serious a badge is; shown by word and by a colour-blind-safe fill. */
    public enum Severity { SEVERE, NOTABLE, INFO }

    public record Badge(String text, Severity severity, String detail) {
    }

    private CandidateFacts() {
    }

    /** "Flash point 12 °C · GHS category 2" (blend value when it could be computed; "unknown" otherwise). */
    public static String flash(SafetyProfile p, Blend b) {
        if (p == null) {
            return "Flash point unknown · GHS category unknown (no safety profile)";
        }
        SafetyProfile.FlashPoint fp = p.flashPoint();
        String cat = p.ghs().category() == null ? "not classified as flammable" : "GHS category " + p.ghs().category();
        return switch (fp.status()) {
            case LIBRARY -> "Flash point " + Numbers.plain(fp.celsius()) + " °C · " + cat;
            case COMPUTED -> "Flash point " + Numbers.plain(fp.celsius()) + " °C (estimated) · " + cat;
            case NOT_FLAMMABLE -> "No flammable component · not a flammable liquid";
            case NONE_BELOW_BOILING -> "No flash point below the boiling point · " + cat;
            case UNKNOWN -> "Flash point unknown · GHS category unknown" + lowestKnownComponent(b);
        };
    }

    /** When the blend's flash point cannot be estimated, the lowest flash point among its components is still a bound worth showing. */
    private static String lowestKnownComponent(Blend b) {
        BlendComponent low = null;
        for (BlendComponent c : b.components()) {
            Double f = c.solvent().flashPointC();
            if (f != null && (low == null || f < low.solvent().flashPointC())) {
                low = c;
            }
        }
        return low == null ? "" : " (lowest component: " + low.solvent().name() + " " + Numbers.plain(low.solvent().flashPointC()) + " °C)";
    }

    /**
     * The strictest ICH Q3C(R8) class among the components with the guideline's meaning of it
     * (ICH Q3C(R8), 2021, section 2: class 1 to be avoided, class 2 to be limited, class 3 low toxic potential).
     */
    public static String worstIch(Blend b) {
        Integer worst = null;
        for (BlendComponent c : b.components()) {
            Integer k = c.solvent().ichClass();
            if (k != null && (worst == null || k < worst)) {
                worst = k;
            }
        }
        long unlisted = b.components().stream().filter(c -> c.solvent().ichClass() == null).count();
        String tail = unlisted == 0 ? "" : unlisted == b.size() ? "" : " · " + unlisted + " not listed";
        if (worst == null) {
            return "ICH Q3C: not listed (no class assigned; check the guideline)";
        }
        return "ICH Q3C class " + worst + ": " + switch (worst) {
            case 1 -> "to be avoided";
            case 2 -> "to be limited";
            default -> "low toxic potential";
        } + tail;
    }

    /** Health and handling badges: CMR effects first, then the serious single hazards, then watch-outs. */
    public static List<Badge> badges(SafetyProfile p, Blend b) {
        List<Badge> out = new ArrayList<>();
        if (p == null) {
            Set<String> cmr = new LinkedHashSet<>();
            b.components().stream().filter(c -> c.solvent().isCmr()).forEach(c -> cmr.add(c.solvent().name()));
            cmr.forEach(n -> out.add(new Badge("CMR: " + n, Severity.SEVERE, "carcinogen, mutagen or reproductive toxicant")));
            return out;
        }
        for (SafetyProfile.CmrEntry e : p.cmr()) {
            out.add(new Badge(e.effect() + " " + e.category() + " (" + e.code() + ") · " + e.component(), Severity.SEVERE,
                    "CMR: " + e.effect() + ", GHS category " + e.category() + ", " + Numbers.plain(e.volumePercent()) + " % of the liquid"));
        }
        for (SafetyProfile.HazardLine h : p.hazardStatements()) {
            String code = h.code().toUpperCase(Locale.ROOT);
            String word = healthWord(code);
            if (word != null && p.cmr().stream().noneMatch(c -> c.code().equalsIgnoreCase(h.code()))) {
                out.add(new Badge(word + " (" + h.code() + ")", code.startsWith("H30") || code.startsWith("H31") || code.startsWith("H33") && !code.equals("H336")
                        ? Severity.SEVERE : Severity.NOTABLE, h.text() == null ? h.code() : h.text()));
            }
        }
        for (String peroxide : p.peroxideFormers()) {
            out.add(new Badge("peroxide former · " + peroxide, Severity.NOTABLE, "forms explosive peroxides on storage: date, test, inhibit"));
        }
        return out;
    }

    /** A few words for the health H-statements that change how a liquid is handled; null for the others (listed in the safety panel). */
    static String healthWord(String code) {
        return switch (code) {
            case "H300", "H310", "H330" -> "fatal";
            case "H301", "H311", "H331" -> "toxic";
            case "H304" -> "aspiration hazard";
            case "H314" -> "corrosive";
            case "H317" -> "skin sensitiser";
            case "H334" -> "respiratory sensitiser";
            case "H370", "H372" -> "organ damage";
            case "H371", "H373" -> "may damage organs";
            default -> null;
        };
    }

    /** "Cost 3.10 per litre" when every component has a price, else "cost unknown" with how many lack one. */
    public static String cost(Blend b) {
        double sum = 0;
        int missing = 0;
        for (BlendComponent c : b.components()) {
            Double price = c.solvent().pricePerLitre();
            if (price == null) {
                missing++;
            } else {
                sum += price * c.fraction();
            }
        }
        if (missing == 0) {
            return String.format(Locale.ROOT, "Cost %.2f per litre (your prices)", sum);
        }
        return "Cost unknown (" + (missing == b.size() ? "no prices entered" : missing + " of " + b.size() + " without a price") + ")";
    }

    /** "dimethyl sulfoxide 51 %" — the fraction as a whole volume percent. */
    static String component(BlendComponent c) {
        return c.solvent().name() + " " + Math.round(c.fraction() * 100) + " %";
    }
}
