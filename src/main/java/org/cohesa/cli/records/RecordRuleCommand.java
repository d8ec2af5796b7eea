package org.cohesa.cli.records;

import org.cohesa.cli.Output;
import org.cohesa.core.records.FourEyesRule;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa record rule four-eyes on|off --by NAME --reason TEXT}: the register's four-eyes rule, switched as a sealed event. */
@Command(name = "rule", description = "Show or switch the four-eyes rule (author may not review or approve, reviewer may not approve)."
        + " A switch is recorded in the register with who, when and why.")
public final class RecordRuleCommand extends RecordSubcommand {

    /** The rule names a register knows. */
    enum RuleName { four_eyes }

    /** Its values. */
    enum Value { on, off }

    @Parameters(index = "0", paramLabel = "RULE", description = "four-eyes", converter = RuleConverter.class)
    RuleName rule;

    @Parameters(index = "1", arity = "0..1", paramLabel = "on|off", description = "Switch it (omit to show it).")
    Value value;

    @Option(names = "--by", paramLabel = "NAME", description = "Who switches the rule (required to switch).")
    String by;

    @Option(names = "--reason", paramLabel = "TEXT", description = "Why (required to switch).")
    String reason;

    /** The rule's JSON. */
    record Json(String rule, boolean on, String set_by, String set_by_account, String set_at, String reason) {
        static Json of(FourEyesRule r) {
            return new Json("four-eyes", r.on(), r.by(), r.account(), r.at(), r.reason());
        }
    }

    @Override
    protected void run() {
        FourEyesRule r;
        if (value == null) {
            r = repo().fourEyes();
        } else {
            if (by == null || by.isBlank()) {
                throw new org.cohesa.core.InvalidInputException("--by", by == null ? "" : by, "missing: name who switches the rule");
            }
            r = repo().setFourEyes(value == Value.on, by, reason);
        }
        if (json()) {
            Output.json(out(), Json.of(r));
            return;
        }
        out().println("four-eyes rule: " + (r.on() ? "on" : "off") + (r.by() == null ? " (default)"
                : " (set by " + r.by() + (r.account() == null ? "" : ", account " + r.account()) + ", " + r.at() + ": " + r.reason() + ")"));
    }

    /** Accepts "four-eyes" (and "four_eyes"). */
    static final class RuleConverter implements picocli.CommandLine.ITypeConverter<RuleName> {
        @Override
        public RuleName convert(String text) {
            if (text.strip().replace('-', '_').equalsIgnoreCase("four_eyes")) {
                return RuleName.four_eyes;
            }
            throw new org.cohesa.core.InvalidInputException("RULE", text, "the only register rule is four-eyes");
        }
    }
}
