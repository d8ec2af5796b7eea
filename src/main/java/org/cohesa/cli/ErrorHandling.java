package org.cohesa.cli;

import java.io.PrintWriter;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.RowError;
import org.cohesa.store.StoreException;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/** Turns failures into one {@code error:} line and an exit code; stack traces only with --debug. */
final class ErrorHandling {

    private ErrorHandling() {
    }

    static int onParameterError(ParameterException ex, String[] args) {
        PrintWriter err = ex.getCommandLine().getErr();
        err.println("error: " + ex.getMessage());
        if (debug(ex.getCommandLine())) {
            ex.printStackTrace(err);
        }
        err.flush();
        return CohesaCommand.EXIT_BAD_INPUT;
    }

    static int onExecutionError(Exception ex, CommandLine cl, ParseResult parsed) {
        PrintWriter err = cl.getErr();
        int code;
        if (ex instanceof BadRowsException bad) {
            err.println("error: " + bad.source() + ": " + bad.errors().size() + " bad "
                    + (bad.errors().size() == 1 ? "cell" : "cells") + ", nothing was imported");
            for (RowError e : bad.errors()) {
                err.println("  " + e.describe());
            }
            code = CohesaCommand.EXIT_BAD_INPUT;
        } else if (ex instanceof IllegalArgumentException) {
            err.println("error: " + ex.getMessage());
            code = CohesaCommand.EXIT_BAD_INPUT;
        } else if (ex instanceof StoreException) {
            err.println("error: " + ex.getMessage());
            code = CohesaCommand.EXIT_FAILURE;
        } else if (ex instanceof java.io.IOException) {
            err.println("error: " + ex.getMessage());
            code = CohesaCommand.EXIT_BAD_INPUT;
        } else {
            err.println("error: internal failure (" + ex.getClass().getSimpleName() + ": " + ex.getMessage()
                    + "); run again with --debug for details");
            code = CohesaCommand.EXIT_FAILURE;
        }
        if (debug(cl)) {
            ex.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    private static boolean debug(CommandLine cl) {
        Object root = cl.getCommandSpec().root().userObject();
        return root instanceof CohesaCommand c && c.debug;
    }
}
