package org.cohesa.desktop.common;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.safety.Cautions;
import org.cohesa.core.safety.SafetyProfile;

/**
 * A safety profile ({@link org.cohesa.core.safety.SafetyProfiler}) as readable, copyable text for the app:
 * the facts first, then the cautions, always ending with the screening reminder.
 */
public final class SafetyText {

    private SafetyText() {
    }

    public static String describe(SafetyProfile p) {
        StringBuilder b = new StringBuilder();
        b.append(p.blend().describe()).append('\n');
        SafetyProfile.FlashPoint fp = p.flashPoint();
        b.append("Flash point: ").append(switch (fp.status()) {
            case LIBRARY -> Numbers.plain(fp.celsius()) + " °C (library value)";
            case COMPUTED -> Numbers.plain(fp.celsius()) + " °C (estimated, " + fp.model() + ")";
            case NOT_FLAMMABLE -> "no flammable component";
            case NONE_BELOW_BOILING -> "none below the boiling point";
            case UNKNOWN -> "unknown" + (fp.detail().isEmpty() ? "" : " (" + String.join("; ", fp.detail()) + ")");
        }).append('\n');
        if (p.initialBoilingPointC() != null) {
            b.append("Initial boiling point: ").append(Numbers.plain(p.initialBoilingPointC())).append(" °C")
                    .append(p.initialBoilingPointBasis() == null ? "" : " (" + p.initialBoilingPointBasis() + ")").append('\n');
        }
        b.append("GHS flammable liquid: ").append(p.ghs().category() == null ? "not classified" : "category " + p.ghs().category())
                .append(p.packingGroup() == null ? "" : " · UN packing group " + p.packingGroup()).append('\n');
        b.append("Solvent guide rank (CHEM21): ").append(p.guideRank() == null ? "unknown" : p.guideRank().label()).append('\n');
        b.append(String.format(Locale.ROOT, "Mixture exposure index (saturated vapour): %.3g%s%n", p.exposure().index(),
                p.exposure().complete() ? "" : " (incomplete: a component has no exposure limit)"));
        if (!p.ich().isEmpty()) {
            b.append("ICH Q3C(R8):\n");
            for (SafetyProfile.IchLine l : p.ich()) {
                b.append("  ").append(l.component()).append(": ").append(l.entry() == null ? "not listed"
                        : "class " + l.entry().solventClass() + (l.entry().pdeMgPerDay() == null ? "" : ", PDE " + Numbers.plain(l.entry().pdeMgPerDay()) + " mg/day")
                        + (l.entry().limitPpm() == null ? "" : ", limit " + Numbers.plain(l.entry().limitPpm()) + " ppm")).append('\n');
            }
        }
        if (!p.hazardStatements().isEmpty()) {
            b.append("Hazard statements:\n");
            for (SafetyProfile.HazardLine h : p.hazardStatements()) {
                b.append("  ").append(h.code()).append(' ').append(h.text() == null ? "" : h.text());
                if (!p.isPure()) {
                    b.append(" — ").append(String.join(", ", h.carriers().stream()
                            .map(c -> c.name() + " " + Numbers.plain(c.volumePercent()) + " %").toList()));
                }
                b.append('\n');
            }
        }
        b.append("\nCautions\n");
        List<String> cautions = cautions(p);
        for (String c : cautions) {
            b.append("• ").append(c).append('\n');
        }
        return b.toString();
    }

    /** The caution sentences; the last one is always the screening reminder. */
    public static List<String> cautions(SafetyProfile p) {
        List<String> c = new java.util.ArrayList<>(Cautions.forProfile(p));
        if (c.isEmpty() || !c.get(c.size() - 1).equals(Cautions.REMINDER)) {
            c.add(Cautions.REMINDER);
        }
        return c;
    }
}
