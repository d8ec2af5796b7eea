package org.cohesa.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.store.StoreException;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * Turns failures into one {@code error:} line (or, with {@code --json}, an {@code {"error": ...}} object on standard
 * output) and an exit code; stack traces only with {@code --debug}. picocli's own wording ("Error: Missing required…",
 * "'abc' is not a double", "Unmatched argument at index 0") is rephrased here so every message has one form:
 * {@code field 'value': reason}.
 */
final class ErrorHandling {

    private static final Pattern CONVERSION = Pattern.compile("Invalid value for (?:option|positional parameter) '([^']+)': '(.*)' is not an? ([a-z]+)(.*)",
            Pattern.DOTALL);
    private static final Pattern ENUM = Pattern.compile("Invalid value for (?:option|positional parameter) '([^']+)': expected one of \\[(.*)] \\(case-insensitive\\) but was '(.*)'",
            Pattern.DOTALL);

    private ErrorHandling() {
    }

    static int onParameterError(ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        CliFailure f = describe(ex);
        report(cl, f, wantsJson(args));
        if (debug(cl)) {
            ex.printStackTrace(cl.getErr());
            cl.getErr().flush();
        }
        return f.exitCode();
    }

    static int onExecutionError(Exception ex, CommandLine cl, ParseResult parsed) {
        CliFailure f = describe(ex);
        report(cl, f, wantsJson(parsed == null ? new String[0] : parsed.originalArgs().toArray(String[]::new)));
        if (debug(cl)) {
            ex.printStackTrace(cl.getErr());
            cl.getErr().flush();
        }
        return f.exitCode();
    }

    /** picocli's parse failures in our wording. */
    static CliFailure describe(ParameterException ex) {
        String msg = stripPrefix(ex.getMessage());
        if (ex instanceof CommandLine.UnmatchedArgumentException u) {
            return unmatched(u);
        }
        if (ex instanceof CommandLine.MissingParameterException m) {
            List<String> names = m.getMissing().stream().map(ErrorHandling::label).toList();
            String what = names.size() == 1 ? names.get(0) + " is required" : "give " + String.join(" or ", names);
            if (msg.contains("specify one of these")) {
                what = "give " + (names.size() == 2 ? names.get(0) + " or " + names.get(1) : "one of " + String.join(", ", names));
            }
            return CliFailure.plain(what + " (see " + commandPath(ex.getCommandLine()) + " --help)", CohesaCommand.EXIT_BAD_INPUT);
        }
        Matcher e = ENUM.matcher(msg);
        if (e.matches()) {
            return CliFailure.badInput(e.group(1), e.group(3), "must be one of " + e.group(2).toLowerCase(Locale.ROOT).replace(", ", ", "));
        }
        Matcher c = CONVERSION.matcher(msg);
        if (c.matches()) {
            String type = c.group(3);
            String reason = switch (type) {
                case "int", "long", "short", "byte", "integer" -> "not a whole number";
                case "double", "float" -> "not a number";
                default -> ("not a " + type + c.group(4)).strip();
            };
            return CliFailure.badInput(c.group(1), c.group(2), reason);
        }
        if (ex.getCause() instanceof InvalidInputException bad) {
            return CliFailure.badInput(bad.field(), bad.value(), bad.reason());
        }
        ArgSpec arg = ex.getArgSpec();
        if (arg != null && ex.getValue() != null) {
            return CliFailure.badInput(label(arg), ex.getValue(), lowerFirst(msg));
        }
        return CliFailure.plain(lowerFirst(msg), CohesaCommand.EXIT_BAD_INPUT);
    }

    /** A failure while a command ran, in our wording. */
    static CliFailure describe(Exception ex) {
        if (ex instanceof BadRowsException bad) {
            List<String> lines = bad.errors().stream().map(RowError::describe).toList();
            return new CliFailure(bad.source(), null, bad.errors().size() + " bad " + (bad.errors().size() == 1 ? "cell" : "cells")
                    + ", nothing was imported", lines, CohesaCommand.EXIT_BAD_INPUT);
        }
        if (ex instanceof InvalidInputException bad) {
            return CliFailure.badInput(bad.field(), bad.value(), bad.reason());
        }
        if (ex instanceof IllegalArgumentException) {
            return CliFailure.plain(stripPrefix(ex.getMessage()), CohesaCommand.EXIT_BAD_INPUT);
        }
        if (ex instanceof StoreException) {
            return CliFailure.plain(ex.getMessage(), CohesaCommand.EXIT_FAILURE);
        }
        if (ex instanceof NoSuchFileException n) {
            return CliFailure.badInput("file", n.getFile(), "no such file");
        }
        if (ex instanceof AccessDeniedException a) {
            return CliFailure.badInput("file", a.getFile(), "permission denied");
        }
        if (ex instanceof FileSystemException fs) {
            String reason = fs.getReason() == null ? "cannot be used" : lowerFirst(fs.getReason());
            boolean diskFull = reason.contains("no space left");
            return new CliFailure("file", fs.getFile(), reason, List.of(), diskFull ? CohesaCommand.EXIT_FAILURE : CohesaCommand.EXIT_BAD_INPUT);
        }
        if (ex instanceof IOException io) {
            String m = String.valueOf(io.getMessage());
            String lower = m.toLowerCase(Locale.ROOT);
            boolean diskFull = lower.contains("no space left") || lower.contains("disk is full");
            return CliFailure.plain(diskFull && !lower.contains("disk is full") ? "the disk is full (" + m + "); nothing was written" : m,
                    diskFull ? CohesaCommand.EXIT_FAILURE : CohesaCommand.EXIT_BAD_INPUT);
        }
        return CliFailure.plain("internal failure (" + ex.getClass().getSimpleName() + ": " + ex.getMessage()
                + "); run again with --debug for details", CohesaCommand.EXIT_FAILURE);
    }

    private static CliFailure unmatched(CommandLine.UnmatchedArgumentException u) {
        CommandLine cl = u.getCommandLine();
        List<String> unmatched = u.getUnmatched();
        String first = unmatched.isEmpty() ? "" : unmatched.get(0);
        List<String> near = new ArrayList<>(u.getSuggestions());
        boolean option = first.startsWith("-");
        if (near.isEmpty()) {
            near = closest(first, option ? optionNames(cl) : new ArrayList<>(cl.getSubcommands().keySet()));
        }
        String hint = near.isEmpty() ? "" : " (did you mean " + String.join(", ", near.subList(0, Math.min(3, near.size()))) + "?)";
        String where = commandPath(cl);
        if (option) {
            return CliFailure.badInput("option", first, "not an option of " + where + hint + "; see " + where + " --help");
        }
        if (!cl.getSubcommands().isEmpty()) {
            return CliFailure.badInput("command", first, "not a command of " + where + hint + "; see " + where + " --help");
        }
        return CliFailure.badInput("argument", String.join(" ", unmatched), where + " takes no such argument" + hint + "; see " + where + " --help");
    }

    private static List<String> optionNames(CommandLine cl) {
        List<String> names = new ArrayList<>();
        for (OptionSpec o : cl.getCommandSpec().options()) {
            names.addAll(Arrays.asList(o.names()));
        }
        return names;
    }

    /** Up to three candidates within an edit distance of a third of the typed word (at least 2). */
    static List<String> closest(String typed, List<String> candidates) {
        String t = typed.toLowerCase(Locale.ROOT);
        int limit = Math.max(2, t.length() / 3);
        return candidates.stream()
                .map(c -> new Object[] {c, editDistance(t, c.toLowerCase(Locale.ROOT))})
                .filter(p -> (int) p[1] <= limit)
                .sorted(Comparator.comparingInt(p -> (int) p[1]))
                .map(p -> (String) p[0])
                .limit(3)
                .toList();
    }

    /** Levenshtein distance (insert, delete, substitute each cost 1). */
    static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    private static String commandPath(CommandLine cl) {
        List<String> names = new ArrayList<>();
        for (CommandLine c = cl; c != null; c = c.getParent()) {
            names.add(0, c.getCommandName());
        }
        return String.join(" ", names);
    }

    private static String label(ArgSpec a) {
        if (a instanceof OptionSpec o) {
            return o.longestName();
        }
        return a.paramLabel();
    }

    private static void report(CommandLine cl, CliFailure f, boolean json) {
        if (json) {
            PrintWriter out = cl.getOut();
            Output.json(out, f.json());
            out.flush();
        }
        PrintWriter err = cl.getErr();
        err.println("error: " + printable(f.line()));
        for (String d : f.details()) {
            err.println("  " + printable(d));
        }
        err.flush();
    }

    /** Control and bidirectional-override characters from user input are shown as \\uXXXX so they cannot reorder the line. */
    static String printable(String s) {
        StringBuilder b = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            int type = Character.getType(cp);
            if (cp != '\t' && (Character.isISOControl(cp) || type == Character.FORMAT)) {
                b.append(String.format(Locale.ROOT, "\\u%04X", cp));
            } else {
                b.appendCodePoint(cp);
            }
        });
        return b.toString();
    }

    private static boolean wantsJson(String[] args) {
        for (String a : args) {
            if (a.equals("--")) {
                return false;
            }
            if (a.equals("--json")) {
                return true;
            }
        }
        return false;
    }

    private static String stripPrefix(String m) {
        String s = String.valueOf(m).strip();
        while (s.startsWith("Error: ") || s.startsWith("error: ")) {
            s = s.substring(7).strip();
        }
        return s;
    }

    private static String lowerFirst(String s) {
        if (s.isEmpty() || s.length() > 1 && Character.isUpperCase(s.charAt(1))) {
            return s;
        }
        return Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    private static boolean debug(CommandLine cl) {
        Object root = cl.getCommandSpec().root().userObject();
        return root instanceof CohesaCommand c && c.debug;
    }
}
