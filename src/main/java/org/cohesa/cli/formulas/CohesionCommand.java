package org.cohesa.cli.formulas;

import com.fasterxml.jackson.annotation.JsonProperty;

import org.cohesa.cli.Args;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.CohesiveEnergy;
import org.cohesa.core.solvent.Solvent;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code cohesa cohesion}: cohesive energy density and Hildebrand δ from the enthalpy of vaporisation. */
@Command(name = "cohesion", description = "Cohesive energy density and Hildebrand parameter δ = √((ΔHvap − RT)/Vm).")
public final class CohesionCommand extends CohesaSubcommand {

    @ArgGroup(exclusive = true, multiplicity = "1")
    Input input;

    @Option(names = "--temperature", paramLabel = "C", description = "Temperature of the ΔHvap value, °C (default 25).")
    String temperature = "25";

    static final class Input {
        @Option(names = "--solvent", paramLabel = "NAME", required = true) String solvent;
        @ArgGroup(exclusive = false) Explicit explicit;
    }

    static final class Explicit {
        @Option(names = "--hvap", paramLabel = "KJ_PER_MOL", required = true) String hvap;
        @Option(names = "--molar-mass", paramLabel = "G_PER_MOL", required = true) String molarMass;
        @Option(names = "--density", paramLabel = "G_PER_CM3", required = true) String density;
    }

    @Override
    protected void execute() {
        double tC = Args.number("--temperature", temperature);
        if (tC <= -273.15) {
            throw new InvalidInputException("--temperature", temperature, "must be above absolute zero (−273.15 °C)");
        }
        double hvap;
        double mm;
        double rho;
        String label;
        if (input.solvent != null) {
            Solvent s = ctx().library().resolve("--solvent", input.solvent);
            if (s.hvapKjPerMol() == null || s.molarMass() == null || s.density() == null) {
                throw new InvalidInputException("--solvent", input.solvent,
                        "the library lacks its enthalpy of vaporisation, molar mass or density; give --hvap, --molar-mass and --density");
            }
            hvap = s.hvapKjPerMol();
            mm = s.molarMass();
            rho = s.density();
            label = s.name();
        } else {
            hvap = Args.positive("--hvap", input.explicit.hvap);
            mm = Args.positive("--molar-mass", input.explicit.molarMass);
            rho = Args.positive("--density", input.explicit.density);
            label = "given values";
        }
        CohesiveEnergy.Result r;
        try {
            r = CohesiveEnergy.fromVaporisation(hvap, mm, rho, tC + 273.15);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("--hvap", String.valueOf(hvap), e.getMessage());
        }
        if (json()) {
            Output.json(out(), new CohesionReport(label, tC, Output.round(mm / rho, 3), Output.round(r.cohesiveEnergyDensity(), 3),
                    Output.round(r.delta(), 3)));
            return;
        }
        TextTable t = new TextTable("liquid", "T °C", "Vm cm³/mol", "CED MPa", "δ MPa^½");
        t.row(label, Output.fmt(tC, 1), Output.fmt(mm / rho, 2), Output.fmt(r.cohesiveEnergyDensity(), 1), Output.fmt(r.delta(), 2));
        t.print(out());
    }
}

/**
 * {@code cohesa cohesion --json}: molar volume (cm³/mol), cohesive energy density (MPa = J/cm³) and the Hildebrand
 * parameter δ (MPa½) at the given temperature (°C).
 */
record CohesionReport(String liquid, @JsonProperty("temperature_c") double temperatureC, @JsonProperty("molar_volume") double molarVolume,
                      @JsonProperty("cohesive_energy_density") double cohesiveEnergyDensity, double delta) {
}
