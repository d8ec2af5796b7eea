package org.cohesa.desktop.common;

import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;

/** Stored UTC instants shown as the user's local date and time, e.g. "2026-12-03 11:52". */
public final class LocalTimes {

    private static final DateTimeFormatter LOCAL = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

    private LocalTimes() {
    }

    /** {@code utc} (ISO-8601 instant text) in the system time zone; the text itself when it is not an instant. */
    public static String of(String utc) {
        return of(utc, ZoneId.systemDefault());
    }

    static String of(String utc, ZoneId zone) {
        if (utc == null || utc.isBlank()) {
            return "";
        }
        try {
            return LOCAL.format(Instant.parse(utc.strip()).atZone(zone));
        } catch (DateTimeParseException e) {
            return utc;
        }
    }
}
