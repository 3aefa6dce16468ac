package org.chillwright.selection;

import java.time.Instant;
import java.util.List;

/**
 * A saved study as pages see it.
 *
 * @param caseQuery the case form's query string, in the units it was typed in
 * @param ranking   the ranking as it was when saved (or last refreshed)
 */
public record StudyView(long id, long version, String name, String description, String caseQuery,
                        long catalogRevision, List<SavedDesign> ranking, List<SavedRefusal> infeasible,
                        String createdBy, Instant createdAt, Instant rankedAt) {

    public StudyView {
        ranking = List.copyOf(ranking);
        infeasible = List.copyOf(infeasible);
    }

    /** A ranked design as stored with a study. */
    public record SavedDesign(int rank, long moduleId, String supplier, String partNumber, int seriesCount,
                              int parallelCount, double currentA, double powerW, double cop, double marginK) {

        public String key() {
            return moduleId + ":" + seriesCount + "x" + parallelCount;
        }
    }

    /** A module that could not do the job when the study was ranked. */
    public record SavedRefusal(long moduleId, String supplier, String partNumber, String code) {
    }

    /** What a study stores of a ranking. */
    public record SavedRanking(List<SavedDesign> ranking, List<SavedRefusal> infeasible) {
    }
}
