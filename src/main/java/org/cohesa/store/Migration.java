package org.cohesa.store;

import java.util.List;

/**
 * One step of the database schema; {@link Migrations} applies the steps above the stored
 * {@code PRAGMA user_version}, each in its own transaction.
 *
 * @param version     schema version reached after this step (1, 2, …)
 * @param description what the step adds, for the log and the tests
 * @param statements  SQL statements run in order
 */
public record Migration(int version, String description, List<String> statements) {
}
