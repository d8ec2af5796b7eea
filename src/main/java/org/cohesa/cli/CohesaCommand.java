package org.cohesa.cli;

import org.cohesa.cli.bench.BenchCommand;
import org.cohesa.cli.blend.BlendCommand;
import org.cohesa.cli.blend.ReplaceCommand;
import org.cohesa.cli.drying.DryCommand;
import org.cohesa.cli.formulas.CohesionCommand;
import org.cohesa.cli.formulas.DistanceCommand;
import org.cohesa.cli.library.BackupCommand;
import org.cohesa.cli.library.MaterialCommand;
import org.cohesa.cli.library.MaterialsCommand;
import org.cohesa.cli.library.SolventCommand;
import org.cohesa.cli.library.SolventsCommand;
import org.cohesa.cli.records.RecordCommand;
import org.cohesa.cli.safety.HazardsCommand;
import org.cohesa.cli.structure.EstimateCommand;
import org.cohesa.cli.target.FitCommand;

import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;

/**
 * The {@code cohesa} command line. Exit codes: 0 success, 1 failure of the program or the database,
 * 2 bad input (unknown solvent, malformed number, bad file).
 */
@Command(name = "cohesa", mixinStandardHelpOptions = true, scope = ScopeType.INHERIT, versionProvider = CohesaCommand.Version.class,
        description = "Choose solvents and blends with Hansen solubility parameters, screen them for safety, record substitutions.%n"
                + "Results are screening estimates: the supplier's SDS, local codes and your site's licensed safety professionals decide.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:program or database failure", "2:bad input (the message names the field and value)"},
        subcommands = {
                SolventsCommand.class,
                SolventCommand.class,
                DistanceCommand.class,
                CohesionCommand.class,
                MaterialsCommand.class,
                MaterialCommand.class,
                RecordCommand.class,
                BackupCommand.class,
                HazardsCommand.class,
                FitCommand.class,
                EstimateCommand.class,
                DryCommand.class,
                BlendCommand.class,
                ReplaceCommand.class,
                BenchCommand.class,
        })
public final class CohesaCommand implements Runnable {

    public static final int EXIT_BAD_INPUT = 2;
    public static final int EXIT_FAILURE = 1;

    @Option(names = "--db", scope = ScopeType.INHERIT, paramLabel = "FILE",
            description = "Database file (default: $COHESA_HOME/cohesa.db or the user data folder).")
    Path db;

    @Option(names = "--debug", scope = ScopeType.INHERIT, description = "Show stack traces on errors.")
    boolean debug;

    private CliContext context;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The shared context, opened on first use. */
    public CliContext context() {
        if (context == null) {
            context = new CliContext(db);
        }
        return context;
    }

    /** Builds the command line with our error handling, printing to the given writers. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new CohesaCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        // "@name" must stay text: expanding it would file the contents of a file called "name" (e.g. --author @alice)
        cl.setExpandAtFiles(false);
        // 1e400 parses as Infinity and NaN as a number; neither is a value anyone means
        CommandLine.ITypeConverter<Double> finite = CohesaCommand::finiteNumber;
        cl.registerConverter(Double.class, finite);
        cl.registerConverter(double.class, finite);
        cl.setParameterExceptionHandler(ErrorHandling::onParameterError);
        cl.setExecutionExceptionHandler(ErrorHandling::onExecutionError);
        return cl;
    }

    /** Runs the command line and closes the database. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine(out, err);
        try {
            return cl.execute(args);
        } finally {
            CohesaCommand root = cl.getCommand();
            if (root.context != null) {
                root.context.close();
            }
            out.flush();
            err.flush();
        }
    }

    private static Double finiteNumber(String text) {
        try {
            double d = Double.parseDouble(text.strip());
            if (Double.isFinite(d)) {
                return d;
            }
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("'" + text + "' is not a double");
        }
        throw new CommandLine.TypeConversionException("'" + text + "' is not a finite number");
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, java.nio.charset.StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, java.nio.charset.StandardCharsets.UTF_8), true);
        System.exit(run(args, out, err));
    }

    /** Version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"cohesa " + AppVersion.get()};
        }
    }
}
