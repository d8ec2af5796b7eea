package org.cohesa.core.records;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.cohesa.core.hsp.HansenDistance;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.Solvent;

/**
 * Assembles the evidence snapshot from what the workflows computed. The liquids, the target, Ra/RED and
 * the data sources are built here; other workflows (drying path, safety profile, cautions) add their own
 * sections with {@link #section}, so the snapshot grows with the program without changing its format.
 *
 * <p>Ra and RED follow Hansen, C. M., <i>Hansen Solubility Parameters: A User's Handbook</i>, 2nd ed.,
 * CRC Press, 2007, ch. 1 (Ra in MPa^½, RED dimensionless); blend parameters use the volume-fraction rule
 * of the same chapter.
 */
public final class EvidenceBuilder {

    /** Our plain reminder, filed with every record (team rule: results touching fire and toxicity carry it). */
    public static final String SCREENING_NOTE = "The figures in this record are screening estimates from published "
            + "parameters and models. The supplier's safety data sheet, local codes and the site's licensed safety "
            + "professionals decide; test the replacement in the lab before use.";

    private final Blend replaced;
    private final Blend replacement;
    private final String appVersion;
    private TargetRef target;
    private Map<String, String> citations = Map.of();
    private final Map<String, JsonNode> extra = new LinkedHashMap<>();
    private List<String> cautions = List.of(SCREENING_NOTE);

    public EvidenceBuilder(Blend replaced, Blend replacement, String appVersion) {
        this.replaced = Objects.requireNonNull(replaced, "replaced");
        this.replacement = Objects.requireNonNull(replacement, "replacement");
        this.appVersion = Objects.requireNonNull(appVersion, "appVersion");
    }

    public EvidenceBuilder target(TargetRef t) {
        this.target = t;
        return this;
    }

    /** Source key → full citation; only the keys the liquids use are copied into the snapshot. */
    public EvidenceBuilder citations(Map<String, String> keyToCitation) {
        this.citations = Map.copyOf(keyToCitation);
        return this;
    }

    /**
     * The caution sentences to file (e.g. from the safety workflow); they must end with a reminder that the
     * results are screening estimates, else {@link #SCREENING_NOTE} is appended.
     */
    public EvidenceBuilder cautions(List<String> sentences) {
        List<String> c = new ArrayList<>(sentences);
        if (c.isEmpty() || !c.get(c.size() - 1).toLowerCase(java.util.Locale.ROOT).contains("screening estimate")) {
            c.add(SCREENING_NOTE);
        }
        this.cautions = List.copyOf(c);
        return this;
    }

    /** Adds (or replaces) a section computed by another workflow. */
    public EvidenceBuilder section(String name, JsonNode content) {
        if (name == null || name.isBlank() || content == null) {
            throw new IllegalArgumentException("a section needs a name and content");
        }
        extra.put(name, content);
        return this;
    }

    /**
     * The flash point of each liquid as the safety profile has it (library value, or the Liaw 2002 blend estimate), so the
     * liquid sections, the safety section, the cautions and the PDF show one value; null leaves the liquid's own.
     */
    public EvidenceBuilder flashPoints(Double replacedC, String replacedBasis, Double replacementC, String replacementBasis) {
        this.flashReplaced = replacedC == null ? null : new Object[] {replacedC, replacedBasis};
        this.flashReplacement = replacementC == null ? null : new Object[] {replacementC, replacementBasis};
        return this;
    }

    private Object[] flashReplaced;
    private Object[] flashReplacement;

    public Evidence build() {
        ObjectNode root = CanonicalJson.object();
        root.put(Evidence.Sections.APP_VERSION, appVersion);
        if (target != null) {
            ObjectNode t = root.putObject(Evidence.Sections.TARGET);
            t.put("label", target.label());
            HansenParameters c = target.sphere().centre();
            t.put("dD", CanonicalJson.number(c.dD()));
            t.put("dP", CanonicalJson.number(c.dP()));
            t.put("dH", CanonicalJson.number(c.dH()));
            t.put("r0", CanonicalJson.number(target.sphere().r0()));
            t.put("source", target.source());
        }
        root.set(Evidence.Sections.REPLACED, withFlashPoint(liquid(replaced), flashReplaced));
        root.set(Evidence.Sections.REPLACEMENT, withFlashPoint(liquid(replacement), flashReplacement));
        root.set(Evidence.Sections.COMPARISON, comparison());
        ArrayNode cautionArray = root.putArray(Evidence.Sections.CAUTIONS);
        cautions.forEach(cautionArray::add);
        extra.forEach(root::set);
        root.set(Evidence.Sections.DATA_SOURCES, sources());
        return Evidence.of(root);
    }

    private static ObjectNode withFlashPoint(ObjectNode liquid, Object[] fp) {
        if (fp != null) {
            liquid.put("flash_point_c", CanonicalJson.number((Double) fp[0]));
            liquid.put("flash_point_basis", (String) fp[1]);
        }
        return liquid;
    }

    private ObjectNode liquid(Blend b) {
        ObjectNode o = CanonicalJson.object();
        o.put("notation", b.describe());
        if (b.hasHansen()) {
            HansenParameters p = b.hansen();
            o.put("dD", CanonicalJson.number(p.dD()));
            o.put("dP", CanonicalJson.number(p.dP()));
            o.put("dH", CanonicalJson.number(p.dH()));
            if (target != null) {
                o.put("ra_to_target", CanonicalJson.number(target.sphere().ra(p)));
                o.put("red", CanonicalJson.number(target.sphere().red(p)));
                o.put("inside_target", target.sphere().contains(p));
            }
        }
        if (b.size() == 1) {
            Double fp = b.solvents().get(0).flashPointC();
            if (fp != null) {
                o.put("flash_point_c", CanonicalJson.number(fp));
            }
        }
        ArrayNode cs = o.putArray("components");
        for (BlendComponent c : b.components()) {
            cs.add(component(c));
        }
        return o;
    }

    private static ObjectNode component(BlendComponent c) {
        Solvent s = c.solvent();
        ObjectNode o = CanonicalJson.object();
        o.put("name", s.name());
        o.put("cas", s.cas());
        o.put("fraction", CanonicalJson.number(c.fraction()));
        if (s.hasHansen()) {
            o.put("dD", CanonicalJson.number(s.hansen().dD()));
            o.put("dP", CanonicalJson.number(s.hansen().dP()));
            o.put("dH", CanonicalJson.number(s.hansen().dH()));
        }
        putNumber(o, "boiling_point_c", s.boilingPointC());
        putNumber(o, "flash_point_c", s.flashPointC());
        ArrayNode h = o.putArray("hazard_statements");
        s.hazardStatements().forEach(h::add);
        o.put("cmr", s.isCmr());
        o.put("peroxide_former", s.peroxideFormer());
        ExposureLimit x = s.exposure();
        if (x.isKnown()) {
            ObjectNode oel = o.putObject("oel");
            putNumber(oel, "twa_ppm", x.twaPpm());
            putNumber(oel, "stel_ppm", x.stelPpm());
            putNumber(oel, "ceiling_ppm", x.ceilingPpm());
            oel.put("skin", x.skin());
            oel.put("jurisdiction", x.jurisdiction());
        }
        if (s.ichClass() != null) {
            o.put("ich_class", s.ichClass());
        }
        ObjectNode src = o.putObject("sources");
        new TreeMap<>(s.sources()).forEach(src::put);
        o.put("user_entry", s.userEntry());
        return o;
    }

    private ObjectNode comparison() {
        ObjectNode o = CanonicalJson.object();
        if (replaced.hasHansen() && replacement.hasHansen()) {
            HansenParameters a = replaced.hansen();
            HansenParameters b = replacement.hansen();
            o.put("ra_replacement_to_replaced", CanonicalJson.number(HansenDistance.ra(a, b)));
            if (target != null) {
                o.put("red_change", CanonicalJson.number(target.sphere().red(b) - target.sphere().red(a)));
            }
        } else {
            o.put("note", "a liquid without Hansen parameters in the library: no distance computed");
        }
        return o;
    }

    private ObjectNode sources() {
        ObjectNode o = CanonicalJson.object();
        TreeMap<String, String> used = new TreeMap<>();
        for (Blend b : new Blend[] {replaced, replacement}) {
            for (Solvent s : b.solvents()) {
                for (String key : s.sources().values()) {
                    if (key != null && !key.isBlank()) {
                        used.put(key, citations.getOrDefault(key, "see solvent-db/SOURCES.md"));
                    }
                }
            }
        }
        used.forEach(o::put);
        return o;
    }

    private static void putNumber(ObjectNode o, String key, Double value) {
        if (value != null) {
            o.put(key, CanonicalJson.number(value));
        }
    }
}
