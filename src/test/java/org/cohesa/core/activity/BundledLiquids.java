package org.cohesa.core.activity;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.store.BundledData;
import org.cohesa.store.SolventCsv;

/** The bundled solvent table (solvent-db/solvents.csv, every value cited there) for tests of the computations. */
public final class BundledLiquids {

    private static SolventLibrary library;

    private BundledLiquids() {
    }

    public static synchronized SolventLibrary library() {
        if (library == null) {
            BundledData csv = BundledData.resource("solvents.csv");
            try (var in = new InputStreamReader(new java.io.ByteArrayInputStream(csv.bytes()), StandardCharsets.UTF_8)) {
                library = new SolventLibrary(SolventCsv.read("solvents.csv", in, false));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return library;
    }

    public static Solvent get(String name) {
        return library().resolve("test", name);
    }

    public static List<Solvent> all(String... names) {
        return java.util.Arrays.stream(names).map(BundledLiquids::get).toList();
    }
}
