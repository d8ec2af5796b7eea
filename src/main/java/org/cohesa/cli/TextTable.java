package org.cohesa.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/** A plain aligned text table for terminals: numbers right-aligned, text left-aligned. */
public final class TextTable {

    private final List<String> header;
    private final List<List<String>> rows = new ArrayList<>();

    public TextTable(String... header) {
        this.header = List.of(header);
    }

    public TextTable row(Object... cells) {
        List<String> r = new ArrayList<>();
        for (Object c : cells) {
            // stored text may hold direction overrides or control characters: shown escaped, never interpreted
            r.add(c == null ? "-" : org.cohesa.core.TextLimits.visible(c.toString()));
        }
        rows.add(r);
        return this;
    }

    public int size() {
        return rows.size();
    }

    public void print(PrintWriter out) {
        int n = header.size();
        int[] w = new int[n];
        boolean[] numeric = new boolean[n];
        for (int i = 0; i < n; i++) {
            w[i] = header.get(i).length();
            numeric[i] = true;
        }
        for (List<String> r : rows) {
            for (int i = 0; i < n; i++) {
                String c = i < r.size() ? r.get(i) : "";
                w[i] = Math.max(w[i], c.length());
                if (!c.equals("-") && !c.matches("[-+]?[0-9.]+(e[-+]?\\d+)?%?")) {
                    numeric[i] = false;
                }
            }
        }
        out.println(line(header, w, numeric));
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < n; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(w[i]));
        }
        out.println(rule);
        for (List<String> r : rows) {
            out.println(line(r, w, numeric));
        }
        out.flush();
    }

    private static String line(List<String> cells, int[] w, boolean[] numeric) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            String c = i < cells.size() ? cells.get(i) : "";
            if (i > 0) {
                sb.append("  ");
            }
            String pad = " ".repeat(w[i] - c.length());
            sb.append(numeric[i] ? pad + c : (i == w.length - 1 ? c : c + pad));
        }
        return sb.toString().stripTrailing();
    }
}
