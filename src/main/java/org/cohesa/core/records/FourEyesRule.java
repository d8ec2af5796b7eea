package org.cohesa.core.records;

/**
 * The four-eyes rule of a register: the author of a record may not review or approve it, and its reviewer may not also
 * approve it. On by default; a site may switch it off (e.g. a one-person lab), and the switch is a sealed event of
 * the register naming who switched it, when and why.
 *
 * @param on      whether the rule is enforced
 * @param by      who last switched it (null for the default)
 * @param account the account that switched it (null for the default)
 * @param at      when (UTC text; null for the default)
 * @param reason  why (null for the default)
 */
public record FourEyesRule(boolean on, String by, String account, String at, String reason) {

    /** The name under which the rule is stored. */
    public static final String NAME = "four_eyes";

    public static final FourEyesRule DEFAULT = new FourEyesRule(true, null, null, null, null);
}
