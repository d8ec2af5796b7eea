package org.cohesa.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The reviewed tables shipped inside the program (copied from {@code solvent-db/} at build time).
 * A database remembers the SHA-256 of the table it was built from and is refreshed when it changes.
 */
public record BundledData(String name, byte[] bytes) {

    /** Classpath folder the build copies {@code solvent-db/*.csv} into. */
    public static final String RESOURCE_DIR = "/org/cohesa/store/bundled/";

    /** The bundled file {@code fileName} from the classpath. */
    public static BundledData resource(String fileName) {
        try (InputStream in = BundledData.class.getResourceAsStream(RESOURCE_DIR + fileName)) {
            if (in == null) {
                throw new StoreException("bundled table " + fileName + " is missing from the program; rebuild with 'mvn package'");
            }
            return new BundledData(fileName, in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Hex SHA-256 of the content. */
    public String sha256() {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java platform", e);
        }
    }
}
