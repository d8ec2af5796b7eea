package org.cohesa.cli.records;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/** The JSON the {@code record} commands print, as records serialised by Jackson. */
final class RecordJson {

    private RecordJson() {
    }

    /** One record (with its evidence for {@code show} and {@code add}). */
    record Record(long id, String status, String process, String site, String replaced, String replacement, String target,
                  String reason, String author, String author_account, String created, List<Step> history, String head_hash,
                  String damage, @JsonInclude(JsonInclude.Include.NON_NULL) JsonNode evidence) {

        static Record of(SubstitutionRecord r, boolean withEvidence) {
            return new Record(r.id(), r.status().label(), r.content().process(), r.content().site(), r.content().replaced(),
                    r.content().replacement(), r.content().target(), r.content().reason(), r.author(), r.history().get(0).account(),
                    r.created(), r.history().stream().map(Step::of).toList(), r.headHash(), r.damage(),
                    withEvidence ? r.evidence().tree() : null);
        }
    }

    /** One step of a record's history. */
    record Step(int seq, String event, String status, String by, String account, String at, String comment) {
        static Step of(StatusChange c) {
            return new Step(c.seq(), c.kind(), c.status().label(), c.by(), c.account(), c.at(), c.comment());
        }
    }

    /** One problem {@code record verify} found. */
    record Problem(String kind, long record_id, int seq, long position, String detail) {
        static Problem of(ChainProblem p) {
            return new Problem(p.kind().label(), p.recordId(), p.seq(), p.position(), p.detail());
        }
    }

    /** The verdict of {@code record verify}. */
    record Verify(boolean intact, String register, long events, long records, String head_hash, boolean append_only_guards,
                  Long first_record, List<Problem> problems, boolean key_checked, String key_id, long sealed_events,
                  long unsealed_events, boolean anchor_checked, long events_since_anchor, List<String> cannot_detect) {

        static Verify of(ChainReport r, String register, boolean guards, String keyId) {
            return new Verify(r.intact(), register, r.events(), r.records(), r.headHash(), guards,
                    r.firstProblem().map(ChainProblem::recordId).orElse(null), r.problems().stream().map(Problem::of).toList(),
                    r.keyChecked(), keyId, r.sealedEvents(), r.unsealedEvents(), r.anchorChecked(), r.sinceAnchor(), r.limits());
        }
    }

    /** What {@code record export} wrote. */
    record Export(String file, String format, long records, List<Long> ids, boolean chain_intact, String register_head_hash,
                  int unreadable_records) {
    }
}
