package org.cohesa.core.activity;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * One UNIFAC parameter set: subgroups (R, Q, main group) and main-group interaction parameters a_mn (K).
 *
 * <p>Two sets ship as classpath resources in our own CSV format (built by
 * {@code docs/tools/build_unifac_tables.py}, citation lines at the top of each file):
 * <ul>
 * <li>{@link #original()}: original UNIFAC for vapour–liquid equilibria, Fredenslund, Jones, Prausnitz,
 * <i>AIChE J.</i> 21 (1975) 1086, with the revised tables of Hansen et al., <i>Ind. Eng. Chem. Res.</i> 30
 * (1991) 2352, and Wittig et al., <i>Ind. Eng. Chem. Res.</i> 42 (2003) 183;</li>
 * <li>{@link #liquidLiquid()}: the liquid–liquid set of Magnussen, Rasmussen, Fredenslund, <i>Ind. Eng. Chem.
 * Process Des. Dev.</i> 20 (1981) 331, with its own subgroup numbering.</li>
 * </ul>
 * Immutable once loaded.
 */
public final class UnifacParameters {

    private final String name;
    private final Map<Integer, UnifacSubgroup> subgroups;
    private final Map<Long, Double> interactions;

    UnifacParameters(String name, Map<Integer, UnifacSubgroup> subgroups, Map<Long, Double> interactions) {
        this.name = name;
        this.subgroups = Collections.unmodifiableMap(new LinkedHashMap<>(subgroups));
        this.interactions = Map.copyOf(interactions);
    }

    private static final class OriginalHolder {
        static final UnifacParameters SET = load("UNIFAC (original)", "unifac-vle");
    }

    private static final class LiquidLiquidHolder {
        static final UnifacParameters SET = load("UNIFAC LLE (Magnussen 1981)", "unifac-lle");
    }

    /** Original UNIFAC, vapour–liquid parameter set (Hansen et al. 1991; Wittig et al. 2003). */
    public static UnifacParameters original() {
        return OriginalHolder.SET;
    }

    /** Liquid–liquid parameter set (Magnussen et al. 1981). */
    public static UnifacParameters liquidLiquid() {
        return LiquidLiquidHolder.SET;
    }

    public String name() {
        return name;
    }

    /** Subgroups by id, in id order. */
    public Map<Integer, UnifacSubgroup> subgroups() {
        return subgroups;
    }

    public Optional<UnifacSubgroup> subgroup(int id) {
        return Optional.ofNullable(subgroups.get(id));
    }

    /** True when a_mn is published (always for m = n, where a_mm = 0). */
    public boolean hasInteraction(int m, int n) {
        return m == n || interactions.containsKey(key(m, n));
    }

    /** a_mn, K; 0 for m = n; fails for a pair without a published value (check {@link #hasInteraction}). */
    public double a(int m, int n) {
        if (m == n) {
            return 0.0;
        }
        Double v = interactions.get(key(m, n));
        if (v == null) {
            throw new IllegalArgumentException(name + " has no interaction parameter between main groups " + m + " and " + n);
        }
        return v;
    }

    private static long key(int m, int n) {
        return ((long) m << 32) | (n & 0xffffffffL);
    }

    private static UnifacParameters load(String name, String stem) {
        Map<Integer, UnifacSubgroup> sg = new LinkedHashMap<>();
        for (CSVRecord r : records(stem + "-subgroups.csv")) {
            UnifacSubgroup s = new UnifacSubgroup(Integer.parseInt(r.get("subgroup")), r.get("name"),
                    Integer.parseInt(r.get("main_group")), r.get("main_group_name"),
                    Double.parseDouble(r.get("r")), Double.parseDouble(r.get("q")));
            sg.put(s.id(), s);
        }
        Map<Long, Double> ia = new LinkedHashMap<>();
        for (CSVRecord r : records(stem + "-interactions.csv")) {
            ia.put(key(Integer.parseInt(r.get("m")), Integer.parseInt(r.get("n"))), Double.parseDouble(r.get("a_mn_k")));
        }
        return new UnifacParameters(name, sg, ia);
    }

    private static Iterable<CSVRecord> records(String resource) {
        CSVFormat fmt = CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true)
                .setIgnoreSurroundingSpaces(true).get();
        try (InputStream in = UnifacParameters.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing classpath resource " + resource + " in org/cohesa/core/activity");
            }
            try (Reader reader = new InputStreamReader(in, StandardCharsets.UTF_8)) {
                return fmt.parse(reader).getRecords();
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + resource, e);
        }
    }
}
