package org.cohesa.core.blend;

import java.util.Locale;
import java.util.Optional;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;

/**
 * Water as a blend component for a polymer or resin that water itself does not dissolve: left out by default.
 *
 * <p>Volume-fraction mixing puts water's δH (42.3 MPa^½) into a blend at full weight, so ten per cent of water lifts a
 * ketone's δH by about 3.5 MPa^½ and carries acetone or MEK "into" the sphere of PVDF. A formulator would not do it: in
 * the solution of a polymer that water does not dissolve, water is the classic non-solvent that precipitates it (non-solvent
 * induced phase separation, how PVDF and polysulfone membranes are cast from NMP or DMAc into a water bath; common practice,
 * no source), and Hansen's handbook warns that water in mixtures does not behave as its single-molecule parameters say
 * (Hansen 2007, from memory). So for a material of kind polymer or resin whose sphere leaves water outside (RED &gt; 1),
 * water is not a candidate unless the user asks for it (named in {@code --include} or {@code --fixed}, or an aqueous process,
 * {@code --with-water miscible}). Drug substances and other materials keep water: water–cosolvent blends are everyday
 * practice for crystallisation and formulation of small molecules. A polymer whose note says {@value #WATER_SOLUBLE} (PEO,
 * PVP) keeps water whatever its sphere says: the sphere of a water-soluble polymer often leaves water outside, which is the
 * same failure of water's parameters.
 */
public final class WaterInPolymer {

    /** The note phrase that marks a polymer water dissolves (solvent-db/materials.csv, or a user's note). */
    public static final String WATER_SOLUBLE = "water-soluble";

    private WaterInPolymer() {
    }

    /** The reason to leave water out for this material, or empty when water may take part. */
    public static Optional<String> reasonToLeaveOut(Material material, Solvent water) {
        if (material == null || water == null || !water.hasHansen()) {
            return Optional.empty();
        }
        if (material.kind() != MaterialKind.POLYMER && material.kind() != MaterialKind.RESIN) {
            return Optional.empty();
        }
        if (material.note() != null && material.note().toLowerCase(Locale.ROOT).contains(WATER_SOLUBLE)) {
            return Optional.empty();
        }
        double red = material.sphere().red(water.hansen());
        if (red <= 1) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "water left out: it does not dissolve this %s (RED %.1f) and in its solutions "
                + "precipitates it; volume mixing overstates what its δH adds (docs/methods.md; --include water, --fixed water:F or "
                + "--with-water miscible keeps it)", material.kind().key(), red));
    }
}
