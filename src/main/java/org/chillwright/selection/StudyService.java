package org.chillwright.selection;

import java.time.Clock;
import java.util.List;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.NotFoundException;
import org.chillwright.web.StaleEditException;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import tools.jackson.databind.ObjectMapper;

/** Saved studies: a case with the ranking and catalog revision it was saved with, re-runnable later. */
@Service
public class StudyService {

    /** Refusals kept with a study: enough to tell what became infeasible, bounded for a huge catalog. */
    static final int MAX_SAVED_REFUSALS = 5_000;

    private final StudyRepository studies;
    private final SelectionService selection;
    private final ObjectMapper json;
    private final Clock clock;

    StudyService(StudyRepository studies, SelectionService selection, ObjectMapper json, Clock clock) {
        this.studies = studies;
        this.selection = selection;
        this.json = json;
        this.clock = clock;
    }

    /**
     * Ranks the case now and saves it with its ranking.
     *
     * @param caseQuery the case form's query string, kept so the study re-opens in the person's units
     */
    @Transactional
    @PreAuthorize("hasAnyRole('ENGINEER','ADMIN')")
    public StudyView save(String name, String description, String caseQuery, CaseSpec spec, String actor) {
        if (spec.lifecycles().contains(org.chillwright.catalog.Lifecycle.OBSOLETE)) {
            throw new InvalidRequestException("lifecycles",
                    "obsolete modules cannot be part of a new study: untick Obsolete and rank again");
        }
        var result = selection.rank(spec);
        var study = new Study(name.trim(), blankToNull(description), caseQuery, result.catalogRevision(),
                write(saved(result)), actor, clock.instant());
        return view(studies.save(study));
    }

    @Transactional(readOnly = true)
    public List<StudyView> all() {
        return studies.findAllByOrderByCreatedAtDesc().stream().map(this::view).toList();
    }

    @Transactional(readOnly = true)
    public StudyView get(long id) {
        return view(find(id));
    }

    /** The study's case ranked against today's catalog, compared with what was saved. Stores nothing. */
    @Transactional(readOnly = true)
    public StudyChanges rerun(long id, CaseSpec spec) {
        var study = find(id);
        var now = selection.rank(spec);
        return StudyChanges.between(study.getCatalogRevision(), read(study.getRankingJson()), now.catalogRevision(),
                saved(now));
    }

    /** Replaces the saved ranking with today's; refused if someone refreshed it since {@code version}. */
    @Transactional
    @PreAuthorize("hasAnyRole('ENGINEER','ADMIN')")
    public StudyView refresh(long id, long version, CaseSpec spec) {
        var study = find(id);
        if (study.getVersion() != version) {
            throw new StaleEditException("Study", id, version, study.getVersion());
        }
        var now = selection.rank(spec);
        study.reranked(now.catalogRevision(), write(saved(now)), clock.instant());
        return view(studies.saveAndFlush(study));
    }

    private Study find(long id) {
        return studies.findById(id).orElseThrow(() -> new NotFoundException("study", id));
    }

    static StudyView.SavedRanking saved(RankingResult result) {
        var designs = result.candidates().stream().map(row -> {
            var d = row.design();
            var p = d.point();
            return new StudyView.SavedDesign(d.rank(), d.moduleId(), row.supplier(), row.partNumber(), d.seriesCount(),
                    d.parallelCount(), p.currentA(), p.powerW(), Double.isFinite(p.cop()) ? p.cop() : 0, p.marginK());
        }).toList();
        var refusals = result.infeasible().stream().limit(MAX_SAVED_REFUSALS)
                .map(r -> new StudyView.SavedRefusal(r.moduleId(), r.supplier(), r.partNumber(), r.code())).toList();
        return new StudyView.SavedRanking(designs, refusals);
    }

    private StudyView view(Study s) {
        var ranking = read(s.getRankingJson());
        return new StudyView(s.getId(), s.getVersion(), s.getName(), s.getDescription(), s.getCaseQuery(),
                s.getCatalogRevision(), ranking.ranking(), ranking.infeasible(), s.getCreatedBy(), s.getCreatedAt(),
                s.getRankedAt());
    }

    private String write(StudyView.SavedRanking ranking) {
        return json.writeValueAsString(ranking);
    }

    private StudyView.SavedRanking read(String text) {
        return json.readValue(text, StudyView.SavedRanking.class);
    }

    private static String blankToNull(String text) {
        return text == null || text.isBlank() ? null : text.trim();
    }
}
