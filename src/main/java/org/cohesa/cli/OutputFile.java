package org.cohesa.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;

/**
 * Writes a file the user names (a CSV path, a PNG plot, an export) so that nothing is lost by mistake: an existing
 * file is refused unless the user said {@code --overwrite}; anything that is not a regular file (a folder, a device
 * such as {@code /dev/full}, a pipe) is never replaced; the content goes to a temporary file beside the target and is
 * moved into place only when complete, so a full disk or a crash leaves the old file (or none) and no partial one.
 */
public final class OutputFile {

    /** What writes the content. */
    @FunctionalInterface
    public interface Writing {
        void write(OutputStream out) throws IOException;
    }

    private OutputFile() {
    }

    /** Checks the target before any work is done, so a long computation is not wasted on a refused file. */
    public static void check(String field, Path target, boolean overwrite) {
        Path abs = target.toAbsolutePath();
        Path parent = abs.getParent();
        String shown = target.toString();
        if (parent == null || !Files.isDirectory(parent)) {
            throw new InvalidInputException(field, shown, "the folder " + parent + " does not exist");
        }
        if (Files.isDirectory(abs)) {
            throw new InvalidInputException(field, shown, "is a folder; give a file name inside it");
        }
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS) || Files.isSymbolicLink(abs)) {
            if (!Files.isRegularFile(abs, LinkOption.NOFOLLOW_LINKS)) {
                throw new InvalidInputException(field, shown, "exists and is not a regular file; it is never replaced");
            }
            if (!overwrite) {
                throw new InvalidInputException(field, shown, "already exists; give --overwrite to replace it");
            }
        }
        if (!Files.isWritable(parent)) {
            throw new InvalidInputException(field, shown, "cannot write in " + parent + " (permission denied)");
        }
    }

    /** Writes {@code target} all or nothing (see the class comment). */
    public static void write(String field, Path target, boolean overwrite, Writing writing) throws IOException {
        check(field, target, overwrite);
        Path abs = target.toAbsolutePath();
        Path tmp;
        try {
            tmp = Files.createTempFile(abs.getParent(), "." + abs.getFileName(), ".part");
        } catch (IOException e) {
            String why = e instanceof FileSystemException fs && fs.getReason() != null ? fs.getReason() : String.valueOf(e.getMessage());
            if (why.toLowerCase(Locale.ROOT).contains("no space")) {
                throw new IOException("the disk is full: " + target + " was not written", e);
            }
            throw new InvalidInputException(field, target.toString(), "cannot create a file in " + abs.getParent() + " ("
                    + why.toLowerCase(Locale.ROOT) + ")");
        }
        boolean done = false;
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                writing.write(out);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            done = true;
        } catch (FileSystemException e) {
            if (String.valueOf(e.getReason()).toLowerCase(Locale.ROOT).contains("no space")) {
                throw new IOException("the disk is full: " + target + " was not written", e);
            }
            throw e;
        } catch (IOException e) {
            if (String.valueOf(e.getMessage()).toLowerCase(Locale.ROOT).contains("no space")) {
                throw new IOException("the disk is full: " + target + " was not written", e);
            }
            throw e;
        } finally {
            if (!done) {
                Files.deleteIfExists(tmp);
            }
        }
    }
}
