package org.cohesa.core.records;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of checking the register.
 *
 * @param events        events checked
 * @param records       distinct records seen
 * @param headHash      hash of the newest stored event (write it down elsewhere, or use {@code record anchor}, to anchor the chain)
 * @param problems      every break found, by position
 * @param keyChecked    whether the HMACs were checked against a register key
 * @param sealedEvents  events carrying an HMAC
 * @param unsealedEvents events without one (written before the register was keyed)
 * @param anchorChecked whether the chain was compared with an anchor kept elsewhere
 * @param sinceAnchor   events appended after the anchored state (0 without an anchor)
 * @param limits        what this run could not detect, in plain sentences (empty when key and anchor were both used)
 */
public record ChainReport(long events, long records, String headHash, List<ChainProblem> problems, boolean keyChecked,
                          long sealedEvents, long unsealedEvents, boolean anchorChecked, long sinceAnchor, List<String> limits) {

    public ChainReport {
        problems = List.copyOf(problems);
        limits = List.copyOf(limits);
    }

    public ChainReport(long events, long records, String headHash, List<ChainProblem> problems) {
        this(events, records, headHash, problems, false, 0, events, false, 0, List.of());
    }

    public boolean intact() {
        return problems.isEmpty();
    }

    /** The first break by position: the record to investigate first. */
    public Optional<ChainProblem> firstProblem() {
        return problems.stream().findFirst();
    }
}
