package org.cohesa.cli;

import java.util.List;

/**
 * One failure of a command as the user sees it: the field and value it concerns (either may be null when the
 * failure is not about one input), the reason, the exit code and any detail lines (e.g. every bad cell of an import).
 * Printed as one {@code error:} line, or with {@code --json} as {@code {"error": {...}}} on standard output.
 */
public record CliFailure(String field, String value, String reason, List<String> details, int exitCode) {

    public CliFailure {
        details = List.copyOf(details == null ? List.of() : details);
    }

    static CliFailure badInput(String field, String value, String reason) {
        return new CliFailure(field, value, reason, List.of(), CohesaCommand.EXIT_BAD_INPUT);
    }

    static CliFailure plain(String reason, int exitCode) {
        return new CliFailure(null, null, reason, List.of(), exitCode);
    }

    /** The one-line text after {@code error: }: "field 'value': reason", "field: reason" or the reason alone. */
    public String line() {
        if (field == null) {
            return reason;
        }
        return value == null ? field + ": " + reason : field + " '" + value + "': " + reason;
    }

    /** The JSON body: {@code {"error": {"field", "value", "reason", "details"}}}. */
    public record Json(Body error) {
    }

    /** The fields of {@link Json}. */
    public record Body(String field, String value, String reason, List<String> details, int exit_code) {
    }

    Json json() {
        return new Json(new Body(field, value, reason, details, exitCode));
    }
}
