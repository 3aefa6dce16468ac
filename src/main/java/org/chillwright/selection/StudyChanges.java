package org.chillwright.selection;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;

/**
 * What changed between a study's saved ranking and a re-run against today's catalog.
 *
 * @param added      designs ranked now that were not then
 * @param removed    designs ranked then that are not now (archived module, new infeasibility, pushed out)
 * @param moved      designs in both whose rank or COP changed
 * @param newlyInfeasible modules that could do the job then and cannot now
 */
public record StudyChanges(long savedRevision, long currentRevision, List<StudyView.SavedDesign> added,
                           List<StudyView.SavedDesign> removed, List<Move> moved,
                           List<StudyView.SavedRefusal> newlyInfeasible) {

    /** COP differences below this are rounding, not change (the solver resolves currents to 1e-9 A). */
    static final double COP_CHANGE = 1e-6;

    public record Move(StudyView.SavedDesign then, StudyView.SavedDesign now) {
    }

    public boolean unchanged() {
        return added.isEmpty() && removed.isEmpty() && moved.isEmpty() && newlyInfeasible.isEmpty();
    }

    static StudyChanges between(long savedRevision, StudyView.SavedRanking then, long currentRevision,
                                StudyView.SavedRanking now) {
        var before = new HashMap<String, StudyView.SavedDesign>();
        then.ranking().forEach(d -> before.put(d.key(), d));
        var after = new HashMap<String, StudyView.SavedDesign>();
        now.ranking().forEach(d -> after.put(d.key(), d));
        var added = new ArrayList<StudyView.SavedDesign>();
        var moved = new ArrayList<Move>();
        for (var d : now.ranking()) {
            var old = before.get(d.key());
            if (old == null) {
                added.add(d);
            } else if (old.rank() != d.rank() || Math.abs(old.cop() - d.cop()) > COP_CHANGE) {
                moved.add(new Move(old, d));
            }
        }
        var removed = then.ranking().stream().filter(d -> !after.containsKey(d.key())).toList();
        var wasInfeasible = new HashSet<Long>();
        then.infeasible().forEach(r -> wasInfeasible.add(r.moduleId()));
        var newlyInfeasible = now.infeasible().stream().filter(r -> !wasInfeasible.contains(r.moduleId())).toList();
        return new StudyChanges(savedRevision, currentRevision, added, removed, moved, newlyInfeasible);
    }
}
