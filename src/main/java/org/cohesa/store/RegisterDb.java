package org.cohesa.store;

/**
 * Where the register's tables live: the local SQLite database, or a shared PostgreSQL register. Both hold the same
 * tables ({@code record_event}, {@code record_chain_head}); what differs is how a writer is serialised, how a consistent
 * read is taken, and who the acting account is.
 */
public interface RegisterDb {

    /**
     * Runs {@code work} in one transaction that holds the register's write lock from the start (SQLite: BEGIN IMMEDIATE;
     * PostgreSQL: a transaction-scoped advisory lock), so concurrent writers queue instead of forking the chain.
     */
    <T> T write(Database.SqlWork<T> work);

    /** Runs read-only {@code work} on one consistent snapshot of the register. */
    <T> T read(Database.SqlWork<T> work);

    /** "sqlite" or "postgresql". */
    String kind();

    /** The file or server address, for messages (never a password). */
    String location();

    /** The account that acts: the operating-system user for a local file, the database login for a shared register. */
    String account();

    /**
     * Whether {@link #account()} is established by someone other than the user (a database server's login) and so can be
     * held against the four-eyes rule; an operating-system name read by the program on the user's own machine is
     * recorded, but proves nothing by itself.
     */
    boolean accountIsAuthenticated();

    /**
     * Refuses, with one line naming the account, a switch of the register's rules by an account the register does not
     * allow to make it (on a shared register: neither the owner nor a member of {@code cohesa_register_admin}; the server
     * refuses it too). A local register lets whoever can write it switch rules (the switch is recorded).
     */
    default void requireMayChangeRules(java.sql.Connection c, String by) throws java.sql.SQLException {
    }

    /** Prepares the write transaction {@code c} for copying another register's events in verbatim (accounts and all). */
    default void beginVerbatimCopy(java.sql.Connection c) throws java.sql.SQLException {
    }

    /**
     * The id of the secret the server holds to seal this register (schema step 9 on PostgreSQL), or null when the
     * register is sealed with key files (every local register; a shared one that already held events sealed with a key
     * file when the server secret arrived, or whose server lacks pgcrypto).
     */
    default String serverSecretId() {
        return null;
    }

    /** The server's seal check for snapshot {@code c} (only when {@link #serverSecretId()} is not null). */
    default org.cohesa.core.records.ChainSeal serverSeal(java.sql.Connection c, org.cohesa.core.records.ChainHead head,
                                                         org.cohesa.core.records.Anchor anchor) throws java.sql.SQLException {
        throw new UnsupportedOperationException("this register has no server-held secret");
    }

    /** The server's seal of an anchor file's content line (only when {@link #serverSecretId()} is not null). */
    default String serverAnchorMac(String content) {
        throw new UnsupportedOperationException("this register has no server-held secret");
    }

    /** True while the database's own append-only guards on {@code record_event} are in place. */
    boolean guardsInPlace();
}
