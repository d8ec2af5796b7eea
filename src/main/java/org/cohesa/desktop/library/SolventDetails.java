package org.cohesa.desktop.library;

import java.util.List;
import java.util.Map;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.store.SourceCatalog;

/** The selected solvent as readable, copyable text: every known value and the source of each group. */
final class SolventDetails {

    private static final SourceCatalog CATALOG = loadCatalog();

    private SolventDetails() {
    }

    static String describe(Solvent s) {
        StringBuilder b = new StringBuilder();
        b.append(s.name()).append(s.userEntry() ? "  (your own entry)" : "").append('\n');
        if (!s.synonyms().isEmpty()) {
            b.append("also: ").append(String.join("; ", s.synonyms())).append('\n');
        }
        line(b, "CAS", s.cas());
        line(b, "Formula", s.formula());
        line(b, "SMILES", s.smiles());
        line(b, "Family", s.family() == null ? null : s.family().replace('_', ' '));
        b.append('\n');
        if (s.hasHansen()) {
            b.append("δD ").append(Numbers.one(s.hansen().dD())).append("   δP ").append(Numbers.one(s.hansen().dP()))
                    .append("   δH ").append(Numbers.one(s.hansen().dH())).append(" MPa½   (δt ")
                    .append(Numbers.one(s.hansen().total())).append(")\n");
        } else {
            b.append("No Hansen parameters in the library: this liquid cannot take part in searches.\n");
        }
        num(b, "Molar mass", s.molarMass(), "g/mol");
        num(b, "Density", s.density(), "g/cm³");
        num(b, "Molar volume", s.effectiveMolarVolume(), "cm³/mol");
        num(b, "Boiling point", s.boilingPointC(), "°C");
        num(b, "Melting point", s.meltingPointC(), "°C");
        num(b, "Flash point (closed cup)", s.flashPointC(), "°C");
        num(b, "Autoignition", s.fire().autoignitionC(), "°C");
        if (s.fire().lflPct() != null || s.fire().uflPct() != null) {
            b.append("Flammability limits: ").append(Numbers.plain(s.fire().lflPct())).append("–")
                    .append(Numbers.plain(s.fire().uflPct())).append(" vol %\n");
        }
        if (s.exposure().isKnown()) {
            b.append("Exposure limits").append(s.exposure().jurisdiction() == null ? "" : " (" + s.exposure().jurisdiction() + ")")
                    .append(": TWA ").append(orDash(s.exposure().twaPpm())).append(" ppm, STEL ").append(orDash(s.exposure().stelPpm()))
                    .append(" ppm").append(s.exposure().skin() ? ", skin notation" : "").append('\n');
        }
        line(b, "UNIFAC groups", s.unifac().isEmpty() ? null
                : org.cohesa.store.StructureEntries.groupNames(s.unifac().counts()));
        line(b, "H-statements", s.hazardStatements().isEmpty() ? null : String.join(" ", s.hazardStatements()));
        line(b, "ICH Q3C class", s.ichClass() == null ? "not listed" : s.ichClass().toString());
        if (s.peroxideFormer()) {
            b.append("Forms explosive peroxides on storage.\n");
        }
        num(b, "Your price per litre", s.pricePerLitre(), "");
        line(b, "Note", s.note());
        if (!s.sources().isEmpty()) {
            b.append("\nSources\n");
            for (Map.Entry<String, String> e : new java.util.TreeMap<>(s.sources()).entrySet()) {
                String cite = CATALOG.citation(e.getValue()).orElse("");
                b.append("• ").append(e.getKey().replace('_', ' ')).append(": ").append(e.getValue())
                        .append(cite.isEmpty() ? "" : " — " + cite).append('\n');
            }
        }
        b.append("\nScreening data: the supplier's SDS, local codes and your site's licensed safety professionals decide.");
        return b.toString();
    }

    private static void line(StringBuilder b, String label, String value) {
        if (value != null && !value.isBlank()) {
            b.append(label).append(": ").append(value).append('\n');
        }
    }

    private static void num(StringBuilder b, String label, Double v, String unit) {
        if (v != null) {
            b.append(label).append(": ").append(trim(v)).append(unit.isEmpty() ? "" : " " + unit).append('\n');
        }
    }

    private static String trim(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(5)).stripTrailingZeros().toPlainString();
    }

    private static String orDash(Double v) {
        return v == null ? "–" : trim(v);
    }

    private static SourceCatalog loadCatalog() {
        try {
            return SourceCatalog.bundled();
        } catch (RuntimeException e) {
            return new SourceCatalog(Map.of());
        }
    }

}
