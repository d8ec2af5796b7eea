package org.cohesa.store;

import java.util.Locale;

/**
 * Who is at the keyboard of a local register: the operating-system account this process runs under, asked of the
 * operating system by user id (on Unix the name of the real uid, on Windows the logged-on domain user), not the
 * {@code user.name} property, which anyone can set with {@code -Duser.name=}. It is recorded with every event and
 * counts for the four-eyes rule; it is not authenticated by anyone but the operating system of this machine, so it tells
 * apart people who sign in under their own accounts, and nothing more (see docs/records.md).
 */
public final class LocalAccount {

    private static volatile String actingAs;

    private LocalAccount() {
    }

    /** The account the operating system says this process runs under ("unknown" when it cannot say). */
    public static String current() {
        String pretend = actingAs;
        if (pretend != null) {
            return pretend;
        }
        return OS_ACCOUNT;
    }

    private static final String OS_ACCOUNT = fromOperatingSystem();

    private static String fromOperatingSystem() {
        try {
            if (System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("windows")) {
                com.sun.security.auth.module.NTSystem nt = new com.sun.security.auth.module.NTSystem();
                String name = nt.getDomain() == null || nt.getDomain().isBlank() ? nt.getName() : nt.getDomain() + "\\" + nt.getName();
                return clean(name);
            }
            return clean(new com.sun.security.auth.module.UnixSystem().getUsername());
        } catch (LinkageError | RuntimeException noNativeAccess) {
            // a runtime without the jdk.security.auth module: the name the runtime was started with
            return clean(System.getProperty("user.name"));
        }
    }

    private static String clean(String name) {
        return name == null || name.isBlank() ? "unknown" : name.strip();
    }

    /**
     * Acts as another operating-system account inside this process until the returned scope is closed: for tests that
     * play several people in one JVM. Nothing in the program calls it; a person cannot reach it from the command line
     * or the desktop.
     */
    public static Scope actAsInThisProcess(String account) {
        String before = actingAs;
        actingAs = account;
        return () -> actingAs = before;
    }

    /** Ends {@link #actAsInThisProcess}. */
    @FunctionalInterface
    public interface Scope extends AutoCloseable {
        @Override
        void close();
    }
}
