package org.cohesa.store;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.Optional;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.RegisterKey;

/**
 * The file that holds the register key: 64 hex digits on one line, readable only by its owner. It lives outside the
 * database on purpose (someone who can edit or replace the database file should not also hold the key). Where it is:
 * {@code --key FILE}, else {@code $COHESA_REGISTER_KEY}, else {@code register.key} in the user's data folder. A local
 * register creates it on its first write; a shared register's key is the site's, handed to each Cohesa install.
 */
public final class RegisterKeyFile {

    public static final String DEFAULT_NAME = "register.key";

    private RegisterKeyFile() {
    }

    /** The key file to use when none is named on the command line. */
    public static Path defaultPath() {
        String prop = System.getProperty("cohesa.register.key");
        if (prop != null && !prop.isBlank()) {
            return Path.of(prop);
        }
        String env = System.getenv("COHESA_REGISTER_KEY");
        if (env != null && !env.isBlank()) {
            return Path.of(env);
        }
        return DataHome.folder().resolve(DEFAULT_NAME);
    }

    /** The key in {@code file}, or empty when there is no such file. */
    public static Optional<RegisterKey> load(String field, Path file) {
        if (!Files.exists(file)) {
            return Optional.empty();
        }
        if (!Files.isRegularFile(file)) {
            throw new InvalidInputException(field, file.toString(), "is not a regular file");
        }
        try {
            String text = Files.readString(file, StandardCharsets.US_ASCII).strip();
            if (!text.matches("[0-9a-fA-F]{32,128}")) {
                throw new InvalidInputException(field, file.toString(), "is not a register key file (64 hex digits expected)");
            }
            return Optional.of(RegisterKey.fromHex(text));
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new InvalidInputException(field, file.toString(), "cannot be read: " + e.getMessage());
        }
    }

    /** The key in {@code file}, created (random, owner-only) when the file does not exist yet. */
    public static RegisterKey loadOrCreate(String field, Path file) {
        Optional<RegisterKey> existing = load(field, file);
        if (existing.isPresent()) {
            return existing.get();
        }
        byte[] secret = new byte[RegisterKey.BYTES];
        new SecureRandom().nextBytes(secret);
        RegisterKey key = RegisterKey.of(secret);
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            // written whole to a private temporary file, then linked into place: a second process either sees the whole key or none
            Path tmp = Files.createTempFile(parent == null ? Path.of(".") : parent, ".register-key", ".tmp");
            try {
                try {
                    Files.setPosixFilePermissions(tmp, PosixFilePermissions.fromString("rw-------"));
                } catch (UnsupportedOperationException notPosix) {
                    // Windows: the user's data folder is private already
                }
                Files.writeString(tmp, HexFormat.of().formatHex(secret) + "\n", StandardCharsets.US_ASCII, StandardOpenOption.TRUNCATE_EXISTING);
                Files.createLink(file, tmp);
            } finally {
                Files.deleteIfExists(tmp);
            }
            return key;
        } catch (FileAlreadyExistsException raced) {
            // another process created it first: use theirs
            return load(field, file).orElseThrow();
        } catch (IOException e) {
            throw new StoreException("cannot create the register key file " + file + ": " + e.getMessage(), e);
        }
    }
}
