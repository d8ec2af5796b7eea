package org.cohesa.cli;

import picocli.CommandLine.Option;

/** The {@code --json} switch every command carries. */
public final class JsonOption {

    @Option(names = "--json", description = "Print machine-readable JSON instead of a table.")
    boolean json;

    public boolean enabled() {
        return json;
    }
}
