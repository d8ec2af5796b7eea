package org.cohesa.cli.blend;

import org.cohesa.cli.Args;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;
import org.cohesa.cli.TextTable;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.RankedBlend;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code cohesa replace NAME}: substitutes for a solvent in use, single or blended, side by side with it.
 *
 * <p>Without a target the sphere is centred on the solvent being replaced with radius {@value #DEFAULT_RADIUS}
 * MPa^½. Why: if a material's sphere (radius R0) holds the original at RED₀, a substitute at Ra ≤ r from the
 * original has RED ≤ RED₀ + r/R0 (triangle inequality in the Ra metric). The bundled material spheres have a
 * median R0 of 9 MPa^½, so r = 4 keeps the substitute's RED within about 0.45 of the original's for a typical
 * material, while still admitting real alternatives (tabulated solvent parameters themselves carry roughly
 * ±1 MPa^½ of uncertainty).
 */
@Command(name = "replace", description = {
        "Find substitutes (single solvents and blends) for a solvent in use and show them side by side with it.",
        "Without --target the sphere is centred on the solvent itself with radius --radius (default 4 MPa^½)."})
public final class ReplaceCommand extends CohesaSubcommand {

    /** Default radius around the replaced solvent, MPa^½ (see the class comment for why). */
    public static final double DEFAULT_RADIUS = 4.0;

    @Parameters(paramLabel = "NAME", description = "The solvent to replace.")
    String name;

    @Option(names = "--target", paramLabel = "dD,dP,dH,R0", description = "The material's sphere, when known (MPa^½).")
    String target;

    @Option(names = "--radius", paramLabel = "R", description = "Radius of the sphere around the replaced solvent when no --target is given, MPa^½ (default 4).")
    String radius;

    @Mixin
    BlendOptions options;

    @Override
    protected void execute() {
        SolventLibrary lib = ctx().library();
        Solvent original = lib.resolve("NAME", name);
        if (!original.hasHansen()) {
            throw new InvalidInputException("NAME", name, "has no Hansen parameters in the library, so substitutes cannot be ranked");
        }
        SolubilitySphere sphere;
        if (target != null) {
            if (radius != null) {
                throw new InvalidInputException("--radius", radius, "applies only without --target (the target carries its own R0)");
            }
            sphere = Targets.parseSphere("--target", target);
        } else {
            double r = DEFAULT_RADIUS;
            if (radius != null) {
                r = Args.number("--radius", radius);
                if (!(r > 0) || r > 50) {
                    throw new InvalidInputException("--radius", radius, "must be above 0 and at most 50 MPa^½");
                }
            }
            sphere = new SolubilitySphere(original.hansen(), r);
        }
        int k = options.maxComponents();
        BlendConstraints c = options.constraints(lib, original);
        if (c.fixed().size() >= k) {
            throw new InvalidInputException("--max-components", String.valueOf(k), "must exceed the number of fixed components (" + c.fixed().size() + ")");
        }
        BlendDesigner.Request req = new BlendDesigner.Request(sphere, c, k, options.top(), options.rankBy(), options.redLimit(),
                options.keepTwoPhase, options.kelvin());
        BlendDesigner.Result r = BlendDesigner.design(lib.all(), req, PhaseChecks.miscibility(), BlendView.progress(spec.commandLine().getErr()), null);
        if (json()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("original", row(original.name(), List.of(new BlendComponent(original, 1.0)), original.hansen(), sphere, original));
            Map<String, Object> t = new LinkedHashMap<>();
            t.put("dD", sphere.centre().dD());
            t.put("dP", sphere.centre().dP());
            t.put("dH", sphere.centre().dH());
            t.put("r0", sphere.r0());
            t.put("centred_on_original", target == null);
            m.put("target", t);
            m.put("rank_by", options.rankBy().word());
            m.put("search", BlendView.summaryJson(r));
            List<Map<String, Object>> list = new ArrayList<>();
            for (BlendSuggestion s : r.suggestions()) {
                Map<String, Object> j = BlendView.json(s);
                j.putAll(row(null, s.blend().components(), s.blend().point(), sphere, original));
                list.add(j);
            }
            m.put("candidates", list);
            m.put("notice", BlendView.SCREENING);
            Output.json(out(), m);
            return;
        }
        out().println("replacing " + original.name() + "; sphere δD " + Output.fmt(sphere.centre().dD(), 1) + ", δP " + Output.fmt(sphere.centre().dP(), 1)
                + ", δH " + Output.fmt(sphere.centre().dH(), 1) + ", R0 " + Output.fmt(sphere.r0(), 1) + " MPa^½"
                + (target == null ? " (centred on the original)" : ""));
        out().println(BlendView.summary(r));
        TextTable t = new TextTable("", "solvent or blend (volume %)", "dD", "dP", "dH", "Ra to original", "RED", "bp °C", "flash °C", "ICH", "hazard statements", "phases");
        HansenParameters oh = original.hansen();
        t.row("in use", original.name(), Output.fmt(oh.dD(), 1), Output.fmt(oh.dP(), 1), Output.fmt(oh.dH(), 1), "0.00",
                Output.fmt(sphere.red(oh), 3), Output.fmt(original.boilingPointC(), 0), Output.fmt(original.flashPointC(), 0),
                original.ichClass(), String.join(" ", original.hazardStatements()), "single liquid");
        int rank = 1;
        for (BlendSuggestion s : r.suggestions()) {
            RankedBlend b = s.blend();
            Map<String, Object> p = row(null, b.components(), b.point(), sphere, original);
            t.row("#" + rank++, BlendView.describe(b), Output.fmt(b.point().dD(), 1), Output.fmt(b.point().dP(), 1), Output.fmt(b.point().dH(), 1),
                    Output.fmt((Double) p.get("ra_to_original"), 2), Output.fmt(b.red(), 3), p.get("boiling_point_c_text"),
                    Output.fmt(s.flashPointC(), 0), p.get("ich_class"), String.join(" ", asStrings(p.get("hazard_statements"))),
                    BlendView.phaseText(s));
        }
        t.print(out());
        out().println("For blends: bp is the range of the components, flash °C the blend's computed flash point (Liaw et al. 2002; '-' when not flammable or unknown, see --json), ICH the worst component class.");
        BlendView.notes(out(), r.suggestions());
        out().println(BlendView.SCREENING);
    }

    @SuppressWarnings("unchecked")
    private static List<String> asStrings(Object o) {
        return (List<String>) o;
    }

    /** Side-by-side properties of a solvent or blend. */
    private static Map<String, Object> row(String label, List<BlendComponent> comps, HansenParameters point, SolubilitySphere sphere, Solvent original) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (label != null) {
            m.put("name", label);
            m.put("dD", point.dD());
            m.put("dP", point.dP());
            m.put("dH", point.dH());
            m.put("red", Output.round(sphere.red(point), 4));
            m.put("flash_point_c", original.flashPointC());
        }
        m.put("ra_to_original", Output.round(original.hansen().distanceTo(point), 4));
        Double bpMin = null;
        Double bpMax = null;
        Double flash = null;
        Integer ich = null;
        boolean ichUnknown = false;
        Set<String> h = new LinkedHashSet<>();
        for (BlendComponent c : comps) {
            Solvent s = c.solvent();
            if (s.boilingPointC() != null) {
                bpMin = bpMin == null ? s.boilingPointC() : Math.min(bpMin, s.boilingPointC());
                bpMax = bpMax == null ? s.boilingPointC() : Math.max(bpMax, s.boilingPointC());
            }
            if (s.flashPointC() != null) {
                flash = flash == null ? s.flashPointC() : Math.min(flash, s.flashPointC());
            }
            if (s.ichClass() == null) {
                ichUnknown = true;
            } else {
                ich = ich == null ? s.ichClass() : Math.min(ich, s.ichClass());
            }
            h.addAll(s.hazardStatements());
        }
        m.put("boiling_point_c_min", bpMin);
        m.put("boiling_point_c_max", bpMax);
        m.put("boiling_point_c_text", bpMin == null ? "-" : bpMin.equals(bpMax) ? Output.fmt(bpMin, 0) : Output.fmt(bpMin, 0) + "–" + Output.fmt(bpMax, 0));
        m.put("lowest_component_flash_point_c", flash);
        m.put("ich_class", ich == null ? (ichUnknown ? "not listed" : null) : ichUnknown ? ich + " + not listed" : ich);
        m.put("hazard_statements", new ArrayList<>(h));
        return m;
    }
}
