package org.cohesa.core.target;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.store.BundledData;
import org.cohesa.store.SolventCsv;

/** The real bundled solvent table, for fit tests. */
final class BundledLibrary {

    private static SolventLibrary library;

    private BundledLibrary() {
    }

    static synchronized SolventLibrary get() {
        if (library == null) {
            BundledData b = BundledData.resource("solvents.csv");
            try {
                library = new SolventLibrary(SolventCsv.read(b.name(),
                        new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return library;
    }

    static List<Solvent> searchable() {
        return get().searchable();
    }
}
