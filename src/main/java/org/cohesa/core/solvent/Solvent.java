package org.cohesa.core.solvent;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.cohesa.core.TextLimits;
import org.cohesa.core.hsp.HansenParameters;

/**
 * One liquid of the library with the properties the workflows need. Numeric properties are
 * {@code null} where no source gives them: the app never guesses a value.
 *
 * @param name              name as chemists write it, e.g. "1,4-dioxane"
 * @param synonyms          other names and abbreviations
 * @param cas               CAS registry number, or null
 * @param formula           Hill formula, or null
 * @param smiles            SMILES of the structure, or null (source key in {@code sources} under "smiles")
 * @param family            primary chemical family key, e.g. "ester"
 * @param families          every chemical family that applies, the primary one first (e.g. ["glycol_ether", "ester"])
 * @param molarMass         g/mol
 * @param density           g/cm³ at 20–25 °C
 * @param molarVolume       cm³/mol
 * @param hansen            Hansen parameters, MPa^½, or null when no source gives them
 * @param boilingPointC     normal boiling point, °C
 * @param meltingPointC     melting point, °C
 * @param fire              flash point, autoignition, flammability limits
 * @param vapourPressure    vapour-pressure correlation (published equation or stored estimate), or null
 * @param hvapKjPerMol      enthalpy of vaporisation at 25 °C, kJ/mol
 * @param exposure          occupational exposure limits
 * @param hazardStatements  GHS H-codes, e.g. ["H225", "H361d"]
 * @param peroxideFormer    true for liquids that form explosive peroxides on storage
 * @param ichClass          ICH Q3C residual-solvent class (1–3), or null when not listed
 * @param unifac            original-UNIFAC group assignment ({@link UnifacAssignment#NONE} when unknown)
 * @param pricePerLitre     user-entered price per litre (any currency), or null
 * @param sources           property-group key (e.g. "hsp", "flash_point") → source key
 * @param note              curation note
 * @param userEntry         true for the user's own entries, false for the bundled data
 */
public record Solvent(
        String name,
        List<String> synonyms,
        String cas,
        String formula,
        String smiles,
        String family,
        List<String> families,
        Double molarMass,
        Double density,
        Double molarVolume,
        HansenParameters hansen,
        Double boilingPointC,
        Double meltingPointC,
        FireData fire,
        VapourCorrelation vapourPressure,
        Double hvapKjPerMol,
        ExposureLimit exposure,
        List<String> hazardStatements,
        boolean peroxideFormer,
        Integer ichClass,
        UnifacAssignment unifac,
        Double pricePerLitre,
        Map<String, String> sources,
        String note,
        boolean userEntry) {

    public Solvent {
        name = TextLimits.name("name", name);
        synonyms = List.copyOf(Objects.requireNonNullElse(synonyms, List.of()));
        smiles = smiles == null || smiles.isBlank() ? null : smiles.strip();
        family = family == null || family.isBlank() ? null : family.strip();
        families = Objects.requireNonNullElse(families, List.<String>of()).stream()
                .filter(f -> f != null && !f.isBlank()).map(String::strip).distinct().toList();
        if (family == null && !families.isEmpty()) {
            family = families.get(0);
        } else if (family != null && !families.contains(family)) {
            families = java.util.stream.Stream.concat(java.util.stream.Stream.of(family), families.stream()).toList();
        } else if (family != null && !families.get(0).equals(family)) {
            String primary = family;
            families = java.util.stream.Stream.concat(java.util.stream.Stream.of(primary),
                    families.stream().filter(f -> !f.equals(primary))).toList();
        }
        hazardStatements = List.copyOf(Objects.requireNonNullElse(hazardStatements, List.of()));
        fire = Objects.requireNonNullElse(fire, FireData.NONE);
        exposure = Objects.requireNonNullElse(exposure, ExposureLimit.NONE);
        unifac = Objects.requireNonNullElse(unifac, UnifacAssignment.NONE);
        sources = Map.copyOf(Objects.requireNonNullElse(sources, Map.of()));
        requireNonNegative("molar_mass", molarMass, true);
        requireNonNegative("density", density, true);
        requireNonNegative("molar_volume", molarVolume, true);
        requireNonNegative("price_per_litre", pricePerLitre, false);
        if (ichClass != null && (ichClass < 1 || ichClass > 3)) {
            throw new IllegalArgumentException("ich_class must be 1, 2 or 3, got " + ichClass);
        }
    }

    /** True when the solvent has Hansen parameters and so can take part in searches. */
    public boolean hasHansen() {
        return hansen != null;
    }

    /** True when {@code familyKey} is one of the solvent's families (primary or not). */
    public boolean inFamily(String familyKey) {
        return families.contains(familyKey);
    }

    /** Flash point (closed cup), °C, or null. */
    public Double flashPointC() {
        return fire.flashPointC();
    }

    /** True when any H-statement of the carcinogen (H350), mutagen (H340) or reproductive-toxicant (H360) families applies. */
    public boolean isCmr() {
        return hazardStatements.stream().anyMatch(h -> h.startsWith("H340") || h.startsWith("H350") || h.startsWith("H360"));
    }

    /** Molar volume, cm³/mol: the stored value, or M/ρ when only those are known. */
    public Double effectiveMolarVolume() {
        if (molarVolume != null) {
            return molarVolume;
        }
        return molarMass != null && density != null ? molarMass / density : null;
    }

    /** A copy with another price (user data). */
    public Solvent withPricePerLitre(Double price) {
        return new Solvent(name, synonyms, cas, formula, smiles, family, families, molarMass, density, molarVolume, hansen, boilingPointC,
                meltingPointC, fire, vapourPressure, hvapKjPerMol, exposure, hazardStatements, peroxideFormer, ichClass, unifac,
                price, sources, note, userEntry);
    }

    /** A copy with other Hansen parameters (e.g. shifted to a process temperature). */
    public Solvent withHansen(HansenParameters shifted) {
        return new Solvent(name, synonyms, cas, formula, smiles, family, families, molarMass, density, molarVolume, shifted, boilingPointC,
                meltingPointC, fire, vapourPressure, hvapKjPerMol, exposure, hazardStatements, peroxideFormer, ichClass, unifac,
                pricePerLitre, sources, note, userEntry);
    }

    /** A copy marked as a user entry or as bundled data. */
    public Solvent withUserEntry(boolean user) {
        return new Solvent(name, synonyms, cas, formula, smiles, family, families, molarMass, density, molarVolume, hansen, boilingPointC,
                meltingPointC, fire, vapourPressure, hvapKjPerMol, exposure, hazardStatements, peroxideFormer, ichClass, unifac,
                pricePerLitre, sources, note, user);
    }

    private static void requireNonNegative(String field, Double value, boolean strictlyPositive) {
        if (value == null) {
            return;
        }
        if (!Double.isFinite(value) || value < 0 || (strictlyPositive && value == 0)) {
            throw new IllegalArgumentException(field + " must be a " + (strictlyPositive ? "positive" : "non-negative") + " number, got " + value);
        }
    }
}
