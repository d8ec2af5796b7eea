package org.cohesa.cli;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.cohesa.core.InvalidInputException;

/**
 * Opens a file the user names on the command line and reads it as UTF-8 text, turning every way it can be unusable
 * (missing, a folder, unreadable, not UTF-8, broken CSV quoting) into one {@link InvalidInputException} that names
 * the argument and the file.
 */
public final class InputFile {

    /** What reads the text. */
    @FunctionalInterface
    public interface Reading<T> {
        T read(Reader reader) throws IOException;
    }

    private static final Pattern CSV_EOF = Pattern.compile("\\(startline (\\d+)\\) EOF reached before encapsulated token finished");

    private InputFile() {
    }

    public static <T> T read(String field, Path file, Reading<T> reading) throws IOException {
        String shown = file.toString();
        if (Files.isDirectory(file)) {
            throw new InvalidInputException(field, shown, "is a folder, not a file");
        }
        if (!Files.exists(file)) {
            throw new InvalidInputException(field, shown, "no such file");
        }
        if (!Files.isRegularFile(file)) {
            throw new InvalidInputException(field, shown, "is not a regular file");
        }
        try (Reader r = new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT))) {
            return reading.read(r);
        } catch (NoSuchFileException e) {
            throw new InvalidInputException(field, shown, "no such file");
        } catch (AccessDeniedException e) {
            throw new InvalidInputException(field, shown, "cannot be read (permission denied)");
        } catch (CharacterCodingException e) {
            throw new InvalidInputException(field, shown, "not UTF-8 text (save it as CSV in UTF-8)");
        } catch (UncheckedIOException e) {
            throw translate(field, shown, e.getCause());
        } catch (IOException e) {
            if (e.getCause() instanceof CharacterCodingException || e instanceof org.apache.commons.csv.CSVException) {
                throw translate(field, shown, e);
            }
            throw e;
        }
    }

    private static InvalidInputException translate(String field, String shown, IOException cause) {
        if (cause instanceof CharacterCodingException || cause != null && cause.getCause() instanceof CharacterCodingException) {
            return new InvalidInputException(field, shown, "not UTF-8 text (save it as CSV in UTF-8)");
        }
        String m = cause == null ? "" : String.valueOf(cause.getMessage());
        Matcher eof = CSV_EOF.matcher(m);
        if (eof.find()) {
            return new InvalidInputException(field, shown, "not a readable CSV table: the quoted field that opens on line "
                    + eof.group(1) + " is never closed");
        }
        return new InvalidInputException(field, shown, "not a readable CSV table (" + m + ")");
    }
}
