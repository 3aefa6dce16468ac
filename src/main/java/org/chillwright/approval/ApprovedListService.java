package org.chillwright.approval;

import java.io.IOException;
import java.time.Clock;
import java.util.List;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.chillwright.approval.AuditRecord.Action;
import org.chillwright.account.Role;
import org.chillwright.account.TeamSettings;
import org.chillwright.web.ConflictException;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.NotFoundException;
import org.chillwright.web.StaleEditException;
import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Approved part lists and their sign-off workflow. Every change of an entry and its audit line are
 * written in one transaction, so the trail never misses a change nor records one that did not
 * happen. A role that may not make a change gets {@link AccessDeniedException} (403); a state that
 * does not allow it, or an edit of an older version, a {@code 409}.
 */
@Service
public class ApprovedListService {

    private final ApprovedListRepository lists;
    private final ListEntryRepository entries;
    private final AuditRecordRepository audit;
    private final ModuleDirectory modules;
    private final TeamSettings settings;
    private final Clock clock;

    ApprovedListService(ApprovedListRepository lists, ListEntryRepository entries, AuditRecordRepository audit,
            ModuleDirectory modules, TeamSettings settings, Clock clock) {
        this.lists = lists;
        this.entries = entries;
        this.audit = audit;
        this.modules = modules;
        this.settings = settings;
        this.clock = clock;
    }

    @Transactional(readOnly = true)
    public List<ListSummary> lists() {
        var approved = entries.findAll().stream().collect(Collectors.groupingBy(ListEntry::getListId));
        return lists.findAll().stream()
                .sorted((a, b) -> a.getName().compareToIgnoreCase(b.getName()))
                .map(list -> {
                    var onList = approved.getOrDefault(list.getId(), List.of());
                    int approvedCount = (int) onList.stream().filter(e -> e.getState() == EntryState.APPROVED).count();
                    return new ListSummary(list.getId(), list.getName(), list.getDescription(), onList.size(),
                            approvedCount, list.getChangedAt());
                })
                .toList();
    }

    @Transactional(readOnly = true)
    public ListView list(long listId) {
        return view(find(listId));
    }

    /** The ids of the catalog modules APPROVED on this list: a ranking restricted to the list uses only these. */
    @Transactional(readOnly = true)
    public List<Long> approvedModuleIds(long listId) {
        find(listId);
        return entries.findByListIdAndStateOrderByModuleIdAsc(listId, EntryState.APPROVED).stream()
                .map(ListEntry::getModuleId).toList();
    }

    /** Every list the module is on, with its state there. */
    @Transactional(readOnly = true)
    public List<Placement> placementsOf(long moduleId) {
        var onLists = entries.findByModuleIdOrderByListIdAsc(moduleId);
        var names = lists.findAllById(onLists.stream().map(ListEntry::getListId).distinct().toList()).stream()
                .collect(Collectors.toMap(ApprovedList::getId, ApprovedList::getName));
        return onLists.stream().map(e -> new Placement(e.getListId(), names.get(e.getListId()), e.getId(), e.getState()))
                .toList();
    }

    @Transactional
    public ListView create(String name, String description, Actor actor) {
        requireRole(actor, Workflow.LIST_EDITORS, "create lists");
        if (lists.existsByName(name)) {
            throw nameTaken(name);
        }
        try {
            return view(lists.saveAndFlush(new ApprovedList(name, description, actor.username(), clock.instant())));
        } catch (DataIntegrityViolationException raced) {
            throw nameTaken(name);
        }
    }

    /** Renames a list or changes its description, if nobody changed it since {@code version}. */
    @Transactional
    public ListView edit(long listId, long version, String name, String description, Actor actor) {
        requireRole(actor, Workflow.LIST_EDITORS, "edit lists");
        var list = find(listId);
        requireVersion("list", listId, version, list.getVersion());
        if (lists.existsByNameAndIdNot(name, listId)) {
            throw nameTaken(name);
        }
        list.rename(name, description, actor.username(), clock.instant());
        return view(flush(list, lists::saveAndFlush, "list", listId, version));
    }

    /** Puts a catalog module on the list in state PROPOSED. */
    @Transactional
    public EntryView propose(long listId, long moduleId, String note, Actor actor) {
        requireRole(actor, Workflow.PROPOSERS, "propose modules");
        find(listId);
        var module = modules.find(moduleId).orElseThrow(() -> new InvalidRequestException("moduleId",
                "no catalog module has id " + moduleId));
        if (module.obsolete()) {
            throw new ConflictException("moduleId", "module " + moduleId + " is obsolete in the catalog; "
                    + "propose its successor instead");
        }
        if (entries.existsByListIdAndModuleId(listId, moduleId)) {
            throw alreadyOnList(moduleId);
        }
        var entry = new ListEntry(listId, moduleId, note, actor.username(), clock.instant());
        try {
            entry = entries.saveAndFlush(entry);
        } catch (DataIntegrityViolationException raced) {
            throw alreadyOnList(moduleId);
        }
        audit.save(new AuditRecord(entry, Action.PROPOSED, null, actor.username(), entry.getProposedAt(),
                note == null || note.isBlank() ? "proposed" : note));
        return view(entry, module);
    }

    /**
     * Moves an entry to another state, with the reason recorded in the audit trail. An approval by the
     * entry's proposer or qualifier is refused while the team keeps the four-eyes rule
     * ({@link FourEyesRefusedException}, 409); the audit line of an approval names both of them.
     *
     * @param version the entry version the person saw, or null to act on whatever is stored
     * @param replacedByEntryId only for {@code OBSOLETE}: the entry on the same list that replaces it
     */
    @Transactional
    public EntryView transition(long listId, long entryId, EntryState to, String reason, Long version,
            Long replacedByEntryId, Actor actor) {
        if (!Workflow.roleAllows(actor, to)) {
            throw new AccessDeniedException("Your roles do not allow moving an entry to " + to);
        }
        var entry = findEntry(listId, entryId);
        if (version != null) {
            requireVersion("entry", entryId, version, entry.getVersion());
        }
        EntryState from = entry.getState();
        if (!Workflow.stateAllows(from, to)) {
            var possible = Workflow.movesFrom(from);
            throw new ConflictException("to", "an entry in state " + from + " cannot move to " + to
                    + (possible.isEmpty() ? "; it is final" : " (from " + from + " it can move to " + possible + ")"));
        }
        var refusal = Workflow.fourEyesRefusal(to, entry.getProposedBy(), entry.getQualifiedBy(), actor,
                settings.fourEyesApproval());
        if (refusal.isPresent()) {
            throw new FourEyesRefusedException(refusal.get());
        }
        checkReplacement(entry, to, replacedByEntryId);
        entry.moveTo(to, replacedByEntryId, actor.username(), clock.instant());
        entry = flush(entry, entries::saveAndFlush, "entry", entryId, entry.getVersion());
        audit.save(new AuditRecord(entry, Action.TRANSITION, from, actor.username(), entry.getChangedAt(), reason));
        return view(entry);
    }

    /** Purchasing's commercial note on an entry (second source, price agreement, lead-time risk). */
    @Transactional
    public EntryView annotate(long listId, long entryId, String commercialNote, Long version, Actor actor) {
        requireRole(actor, Workflow.COMMERCIAL_ANNOTATORS, "add commercial notes");
        var entry = findEntry(listId, entryId);
        if (version != null) {
            requireVersion("entry", entryId, version, entry.getVersion());
        }
        entry.annotate(commercialNote, actor.username(), clock.instant());
        entry = flush(entry, entries::saveAndFlush, "entry", entryId, entry.getVersion());
        audit.save(new AuditRecord(entry, Action.COMMERCIAL_NOTE, entry.getState(), actor.username(),
                entry.getChangedAt(), commercialNote == null || commercialNote.isBlank() ? "commercial note cleared"
                        : commercialNote));
        return view(entry);
    }

    /** The moves this person could make on an entry in this state; empty when none. */
    public Set<EntryState> targetsFor(Actor actor, EntryState from) {
        return Workflow.targetsFor(actor, from);
    }

    /**
     * For each entry this person may move to APPROVED by role but not under the four-eyes rule, why not;
     * for saying so on the page before they try. Empty when the team has relaxed the rule.
     */
    @Transactional(readOnly = true)
    public Map<Long, String> fourEyesNotes(Actor actor, List<EntryView> onList) {
        boolean fourEyes = settings.fourEyesApproval();
        var notes = new LinkedHashMap<Long, String>();
        for (var entry : onList) {
            if (Workflow.targetsFor(actor, entry.state()).contains(EntryState.APPROVED)) {
                Workflow.fourEyesRefusal(EntryState.APPROVED, entry.proposedBy(), entry.qualifiedBy(), actor, fourEyes)
                        .ifPresent(why -> notes.put(entry.id(), why));
            }
        }
        return notes;
    }

    /** Whether approvals need a second person (the team setting). */
    public boolean fourEyesApproval() {
        return settings.fourEyesApproval();
    }

    public boolean mayPropose(Actor actor) {
        return actor.holdsAny(Workflow.PROPOSERS);
    }

    public boolean mayEditLists(Actor actor) {
        return actor.holdsAny(Workflow.LIST_EDITORS);
    }

    public boolean mayAnnotate(Actor actor) {
        return actor.holdsAny(Workflow.COMMERCIAL_ANNOTATORS);
    }

    /** The list's audit trail, oldest first. */
    @Transactional(readOnly = true)
    public List<AuditView> audit(long listId) {
        find(listId);
        return audit.findByListIdOrderByOccurredAtAscIdAsc(listId).stream().map(AuditRecord::view).toList();
    }

    /** Writes the audit trail as CSV (header row, oldest first). */
    @Transactional(readOnly = true)
    public void writeAuditCsv(long listId, Appendable out) throws IOException {
        AuditCsv.write(list(listId), audit(listId), out);
    }

    private void checkReplacement(ListEntry entry, EntryState to, Long replacedByEntryId) {
        if (replacedByEntryId == null) {
            return;
        }
        if (to != EntryState.OBSOLETE) {
            throw new InvalidRequestException("replacedByEntryId", "only an entry moving to OBSOLETE can name a replacement");
        }
        var replacement = entries.findByIdAndListId(replacedByEntryId, entry.getListId())
                .orElseThrow(() -> new InvalidRequestException("replacedByEntryId",
                        "no entry " + replacedByEntryId + " on this list"));
        if (replacement.getId().equals(entry.getId()) || replacement.getState() == EntryState.OBSOLETE) {
            throw new ConflictException("replacedByEntryId", "the replacement must be another entry that is not obsolete");
        }
    }

    /** Writes now rather than at commit, so a concurrent change surfaces here as a stale edit. */
    private static <T> T flush(T entity, Function<T, T> saveAndFlush, String what, long id, long version) {
        try {
            return saveAndFlush.apply(entity);
        } catch (ConcurrencyFailureException concurrent) {
            throw new StaleEditException(what, id, version, version + 1);
        }
    }

    private static void requireVersion(String what, long id, long sent, long stored) {
        if (sent != stored) {
            throw new StaleEditException(what, id, sent, stored);
        }
    }

    private static void requireRole(Actor actor, Set<Role> roles, String what) {
        if (!actor.holdsAny(roles)) {
            throw new AccessDeniedException("Only " + roles + " may " + what);
        }
    }

    private ApprovedList find(long listId) {
        return lists.findById(listId).orElseThrow(() -> new NotFoundException("approved list", listId));
    }

    private ListEntry findEntry(long listId, long entryId) {
        find(listId);
        return entries.findByIdAndListId(entryId, listId).orElseThrow(() -> new NotFoundException("list entry", entryId));
    }

    private static ConflictException nameTaken(String name) {
        return new ConflictException("name", "a list named '" + name + "' already exists");
    }

    private static ConflictException alreadyOnList(long moduleId) {
        return new ConflictException("moduleId", "module " + moduleId + " is already on this list");
    }

    private ListView view(ApprovedList list) {
        var onList = entries.findByListIdOrderByIdAsc(list.getId()).stream().map(this::view).toList();
        return new ListView(list.getId(), list.getVersion(), list.getName(), list.getDescription(), list.getCreatedBy(),
                list.getCreatedAt(), list.getChangedBy(), list.getChangedAt(), onList);
    }

    private EntryView view(ListEntry entry) {
        return view(entry, modules.find(entry.getModuleId()).orElse(null));
    }

    private static EntryView view(ListEntry entry, ModuleSummary module) {
        return new EntryView(entry.getId(), entry.getVersion(), entry.getModuleId(),
                module == null ? null : module.supplier(), module == null ? null : module.partNumber(),
                module == null ? null : module.lifecycle(), entry.getState(), entry.getNote(), entry.getCommercialNote(),
                entry.getReplacedByEntryId(), entry.getProposedBy(), entry.getProposedAt(), entry.getChangedBy(),
                entry.getChangedAt(), entry.getQualifiedBy());
    }
}
