package org.cohesa.core.records;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of walking the chain.
 *
 * @param events   events checked
 * @param records  distinct records seen
 * @param headHash hash of the newest stored event (write it down elsewhere to anchor the chain)
 * @param problems every break found, by position
 */
public record ChainReport(long events, long records, String headHash, List<ChainProblem> problems) {

    public ChainReport {
        problems = List.copyOf(problems);
    }

    public boolean intact() {
        return problems.isEmpty();
    }

    /** The first break by position: the record to investigate first. */
    public Optional<ChainProblem> firstProblem() {
        return problems.stream().findFirst();
    }
}
