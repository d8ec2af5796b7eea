package org.cohesa.cli.records;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code cohesa record …}: the register of substitution records. */
@Command(name = "record", description = "File, review, approve, verify and export substitution records (a tamper-evident register).",
        subcommands = {
                RecordAddCommand.class,
                RecordListCommand.class,
                RecordShowCommand.class,
                RecordReviewCommand.class,
                RecordApproveCommand.class,
                RecordRejectCommand.class,
                RecordVerifyCommand.class,
                RecordExportCommand.class,
                RecordAnchorCommand.class,
                RecordRuleCommand.class,
                RecordCopyCommand.class,
        })
public final class RecordCommand implements Runnable {

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
