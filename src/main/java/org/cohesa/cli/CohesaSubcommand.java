package org.cohesa.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** Base of every command: the --json switch, the shared context and the writers. */
public abstract class CohesaSubcommand implements Callable<Integer> {

    @Spec
    protected CommandSpec spec;

    @Mixin
    protected JsonOption jsonOption;

    protected CliContext ctx() {
        return ((CohesaCommand) spec.root().userObject()).context();
    }

    public PrintWriter out() {
        return spec.commandLine().getOut();
    }

    public boolean json() {
        return jsonOption.enabled();
    }

    @Override
    public final Integer call() throws Exception {
        execute();
        out().flush();
        return exitCode();
    }

    /** The exit code after a successful run; a check that found a problem (e.g. {@code record verify}) returns 1. */
    protected int exitCode() {
        return 0;
    }

    /** Does the work; throw {@link IllegalArgumentException} (or a subclass) for bad input. */
    protected abstract void execute() throws Exception;
}
