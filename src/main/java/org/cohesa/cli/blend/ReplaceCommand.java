package org.cohesa.cli.blend;

import org.cohesa.cli.Args;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;
import org.cohesa.cli.TextTable;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.Desirability;
import org.cohesa.core.blend.ReplacementReasons;
import org.cohesa.core.blend.ReactiveExclusion;
import org.cohesa.core.blend.WaterCheck;
import org.cohesa.core.activity.WaterBehaviour;
import org.cohesa.core.blend.ProcessUse;
import org.cohesa.core.target.Material;
import org.cohesa.core.blend.RankedBlend;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.LibraryAtTemperature;
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
    public static final double DEFAULT_RADIUS = Desirability.AROUND_ORIGINAL_RADIUS;

    /**
     * The qualifying RED on the sphere around the original: 1, i.e. Ra ≤ the radius. The 0.8 of a material's sphere is
     * a margin for a fitted sphere's uncertainty; the radius around a solvent is already the chosen tolerance, and applying
     * 0.8 to it as well shrank it to 3.2 MPa^½, where substitutes keep 85 % of the bundled materials the original
     * dissolves instead of the 80 % the radius was chosen for (docs/methods.md, ReplaceRadiusTest).
     */
    public static final double CENTRED_RED_LIMIT = Desirability.AROUND_ORIGINAL_RED_LIMIT;

    @Parameters(paramLabel = "NAME", description = "The solvent to replace.")
    String name;

    @Option(names = "--target", paramLabel = "dD,dP,dH,R0", description = "The material's sphere, when known (MPa^½).")
    String target;

    @Option(names = "--material", paramLabel = "NAME", description = "The material the solvent dissolves, from the library (see 'materials'); its sphere is the target.")
    String material;

    @Option(names = "--radius", paramLabel = "R", description = "Radius of the sphere around the replaced solvent when no --target or --material is given, MPa^½ (default 4).")
    String radius;

    @Option(names = "--because", paramLabel = "REASONS", description = {
            "Why the solvent is replaced (repeat or separate with commas): reprotoxic, carcinogen, mutagen, cmr, organ, toxic, aspiration, health, ozone,",
            "flammable, ich, high-boiling, low-boiling. No candidate is as bad as the original on a named reason.",
            "Default: every CMR, organ-damage (STOT) and acute-toxicity statement the original carries (acute toxicity category 4, 'harmful', alone excepted)."})
    List<String> because = new ArrayList<>();

    @Mixin
    BlendOptions options;

    @Override
    protected void execute() {
        // the solvents' parameters at the process temperature (the material's sphere stays as measured)
        LibraryAtTemperature atTemperature = LibraryAtTemperature.of(ctx().library(), options.kelvin());
        SolventLibrary lib = atTemperature.library();
        Solvent original = lib.resolve("NAME", name);
        if (!original.hasHansen()) {
            throw new InvalidInputException("NAME", name, "has no Hansen parameters in the library, so substitutes cannot be ranked");
        }
        if (target != null && material != null) {
            throw new InvalidInputException("--material", material, "give --target or --material, not both");
        }
        SolubilitySphere sphere;
        Material mat = null;
        if (target != null || material != null) {
            if (radius != null) {
                throw new InvalidInputException("--radius", radius, "applies only without --target or --material (they carry their own R0)");
            }
            if (material != null) {
                mat = ctx().materials().library().resolve("--material", material);
                sphere = mat.sphere();
            } else {
                sphere = Targets.parseSphere("--target", target);
            }
        } else {
            double r = DEFAULT_RADIUS;
            if (radius != null) {
                r = Args.number("--radius", radius);
                if (!(r > 0) || r > 50) {
                    throw new InvalidInputException("--radius", radius, "must be above 0 and at most 50 MPa^½");
                }
            }
            sphere = new SolubilitySphere(original.hansen(), r);
            // around the original the radius itself is the tolerance (docs/methods.md): Ra ≤ radius qualifies
            options.defaultRedLimit(CENTRED_RED_LIMIT);
        }
        int k = options.maxComponents();
        // the reasons the user named, or by default the original's own health statements (one core rule with the desktop)
        ReplacementReasons why = ReplacementReasons.of("--because", original, ReplacementReasons.split(because));
        BlendConstraints c = options.forSolute(why.applyTo(options.constraints(lib, original), "--boiling-range", "--because"), mat);
        // a substitute does the original's job: under the as-original use it must behave with water as the original does
        // (separate for an extraction or work-up, mix for a water-miscible process; docs/methods.md)
        String waterAsOriginal = null;
        if (!options.waterDemandGiven() && options.processAsOriginal()) {
            WaterBehaviour wb = BlendOptions.waterBehaviour(lib, original, options.kelvin());
            WaterCheck.Need need = wb == null ? null : switch (wb.kind()) {
                case IMMISCIBLE -> WaterCheck.Need.IMMISCIBLE;
                case MISCIBLE -> WaterCheck.Need.MISCIBLE;
                case PARTLY_MISCIBLE -> null;
            };
            if (need != null) {
                c = c.with(c.more().withWater(need));
                waterAsOriginal = "with water as the original: " + original.name() + " is " + wb.kind().label() + " with water ("
                        + wb.detail() + "), so every suggestion must be too (--with-water any drops this, --process another use)";
            }
        }
        // nor a reactivity the original lacks (an acid, a base, a nitroalkane, an active methylene or a Michael acceptor in
        // place of an inert solvent; docs/methods.md), unless --exclude-reactive says which to leave out
        ReactiveExclusion reactive = ReactiveExclusion.of(options.reactiveNamed(), options.processAsOriginal() ? original : null);
        c = reactive.applyTo(c);
        String reactivityAsOriginal = !reactive.fromReplaced() ? null : "reactivity as the original: " + reactive.lack()
                + ", so no suggestion is (--exclude-reactive none keeps them, --exclude-reactive FLAGS leaves out only those, "
                + "--process another use drops this)";
        options.checkPricesExist(lib);
        if (c.fixed().size() >= k) {
            throw new InvalidInputException("--max-components", String.valueOf(k), "must exceed the number of fixed components (" + c.fixed().size() + ")");
        }
        BlendDesigner.Request req = new BlendDesigner.Request(sphere, c, k, options.top(), options.rankBy(), options.redLimit(),
                options.keepTwoPhase, options.kelvin(), replaceWeights(options, original));
        BlendDesigner.Result r = BlendDesigner.design(lib.all(), req, PhaseChecks.miscibility(), BlendOptions.waterCheck(lib, c), BlendView.progress(spec.commandLine().getErr()), null);
        boolean centred = target == null && material == null;
        List<String> replacedFor = why.words();
        if (json()) {
            HansenParameters oh = original.hansen();
            BlendReport.Original o = new BlendReport.Original(original.name(), oh.dD(), oh.dP(), oh.dH(), Output.round(sphere.red(oh), 4),
                    original.flashPointC(), replacedFor, comparison(List.of(new BlendComponent(original, 1.0)), oh, original));
            BlendReport.Target t = new BlendReport.Target(sphere.centre().dD(), sphere.centre().dP(), sphere.centre().dH(), sphere.r0(),
                    mat == null ? null : mat.name(), mat == null ? null : mat.source(), centred);
            Output.json(out(), new BlendReport.Replacement(o, t, BlendReport.Temperature.of(atTemperature), options.rankBy().word(), options.ranking(r, req.weights()), BlendReport.search(r),
                    options.appliedLimits(c), BlendReport.suggestions(r, s -> comparison(s.blend().components(), s.blend().point(), original)),
                    BlendView.SCREENING));
            return;
        }
        out().println("replacing " + original.name() + "; sphere δD " + Output.fmt(sphere.centre().dD(), 1) + ", δP " + Output.fmt(sphere.centre().dP(), 1)
                + ", δH " + Output.fmt(sphere.centre().dH(), 1) + ", R0 " + Output.fmt(sphere.r0(), 1) + " MPa^½"
                + (centred ? " (centred on the original)" : mat != null ? " (" + mat.name() + ", source " + mat.source() + ")" : ""));
        if (atTemperature.describe() != null) {
            out().println(atTemperature.describe() + (centred ? " (the original's own sphere is centred on its shifted parameters)" : ""));
        }
        out().println(replacedFor.isEmpty()
                ? "replaced for: nothing named, and " + original.name() + " carries no CMR, organ-damage or acute-toxicity statement above category 4 (harmful); --because says what must improve"
                : "replaced for: " + String.join("; ", replacedFor));
        out().println(BlendView.summary(r));
        if (waterAsOriginal != null) {
            out().println(waterAsOriginal);
        }
        if (reactivityAsOriginal != null) {
            out().println(reactivityAsOriginal);
        }
        BlendView.header(out(), r, c, options, req.weights());
        TextTable t = new TextTable("", "solvent or blend (volume %)", "dD", "dP", "dH", "Ra to original", "RED", "score", "bp °C", "flash °C", "ICH",
                "hazard statements", "phases");
        HansenParameters oh = original.hansen();
        BlendReport.Comparison oc = comparison(List.of(new BlendComponent(original, 1.0)), oh, original);
        t.row("in use", original.name(), Output.fmt(oh.dD(), 1), Output.fmt(oh.dP(), 1), Output.fmt(oh.dH(), 1), "0.00",
                Output.fmt(sphere.red(oh), 3), "", Output.fmt(original.boilingPointC(), 0), Output.fmt(original.flashPointC(), 0),
                oc.ichClass(), String.join(" ", original.hazardStatements()), "single liquid");
        int rank = 1;
        for (BlendSuggestion s : r.suggestions()) {
            RankedBlend b = s.blend();
            BlendReport.Comparison p = comparison(b.components(), b.point(), original);
            t.row("#" + rank++, BlendView.describe(b), Output.fmt(b.point().dD(), 1), Output.fmt(b.point().dP(), 1), Output.fmt(b.point().dH(), 1),
                    Output.fmt(p.raToOriginal(), 2), Output.fmt(b.red(), 3), Double.isNaN(s.score()) ? "" : Output.fmt(s.score(), 2),
                    p.boilingPointCText(), Output.fmt(s.flashPointC(), 0), p.ichClass(), String.join(" ", p.hazardStatements()),
                    BlendView.phaseText(s));
        }
        t.print(out());
        if (r.suggestions().isEmpty()) {
            out().println("no candidate reaches RED ≤ " + Output.fmt(options.redLimit(), 2) + " under these constraints and reasons"
                    + (centred ? " (--radius widens the sphere around the original; --red-limit the limit)" : " (--red-limit widens the limit)"));
        }
        out().println("For blends: bp is the range of the components, flash °C the blend's computed flash point (Liaw et al. 2002; '-' when not flammable or unknown, see --json), ICH the worst component class.");
        BlendView.notes(out(), r.suggestions(), options.all);
        out().println(BlendView.SCREENING);
    }

    /**
     * The default weights of replace: the process term measures from the original (a substitute should leave the process
     * the way the original does: its evaporation rate within a factor of 3 of the original's, docs/methods.md).
     */
    public static Desirability.Weights defaultWeights(Solvent original) {
        return Desirability.DEFAULT.withProcess(ProcessUse.AS_ORIGINAL, ProcessUse.rate(original)).withComponents(REPLACE_COMPONENTS);
    }

    /** The extra-component weight of a replacement ({@link Desirability#REPLACE_COMPONENTS}, its reason there). */
    public static final double REPLACE_COMPONENTS = Desirability.REPLACE_COMPONENTS;

    static Desirability.Weights replaceWeights(BlendOptions o, Solvent original) {
        Desirability.Weights w = o.weights(ProcessUse.AS_ORIGINAL, original);
        return o.preferenceNamed() ? w : w.withComponents(REPLACE_COMPONENTS);
    }

    /** Side-by-side properties of a solvent or blend. */
    private static BlendReport.Comparison comparison(List<BlendComponent> comps, HansenParameters point, Solvent original) {
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
                ichUnknown = !"7732-18-5".equals(s.cas()) || ichUnknown;
            } else {
                ich = ich == null ? s.ichClass() : Math.min(ich, s.ichClass());
            }
            h.addAll(s.hazardStatements());
        }
        String ichText = ich == null ? (ichUnknown ? "not listed" : "-") : ichUnknown ? ich + " + not listed" : String.valueOf(ich);
        String bpText = bpMin == null ? "-" : bpMin.equals(bpMax) ? Output.fmt(bpMin, 0) : Output.fmt(bpMin, 0) + "–" + Output.fmt(bpMax, 0);
        return new BlendReport.Comparison(Output.round(original.hansen().distanceTo(point), 4), bpMin, bpMax, bpText, flash, ichText, new ArrayList<>(h));
    }
}
