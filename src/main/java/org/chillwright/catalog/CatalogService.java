package org.chillwright.catalog;

import java.io.Reader;
import java.io.Writer;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.chillwright.web.ConflictException;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.NotFoundException;
import org.chillwright.web.StaleEditException;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.data.domain.PageRequest;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * The catalog's public face: find, search, create, edit, archive, CSV import and export, and the
 * in-memory snapshot the ranking sweeps. Entries are never deleted: archiving hides an entry from
 * search and the snapshot, and it stays readable by id (studies and lists keep pointing at it).
 */
@Service
public class CatalogService {

    /** Hot side at which a constructed module's ideal ratings are listed, °C. */
    public static final double CONSTRUCTION_REFERENCE_HOT_SIDE_C = 25.0;
    private static final String MODULE = "module";

    private final ModuleEntryRepository modules;
    private final CatalogSnapshots snapshots;
    private final ApplicationEventPublisher events;
    private final Clock clock;

    CatalogService(ModuleEntryRepository modules, CatalogSnapshots snapshots, ApplicationEventPublisher events,
                   Clock clock) {
        this.modules = modules;
        this.snapshots = snapshots;
        this.events = events;
        this.clock = clock;
    }

    /** A module by id, archived or not. */
    @Transactional(readOnly = true)
    public Optional<ModuleSpec> find(long id) {
        return modules.findById(id).map(ModuleEntry::toSpec);
    }

    /** @throws NotFoundException when no module has this id */
    @Transactional(readOnly = true)
    public ModuleSpec get(long id) {
        return find(id).orElseThrow(() -> new NotFoundException(MODULE, id));
    }

    @Transactional(readOnly = true)
    public ModulePage search(ModuleQuery query) {
        var page = modules.findAll(ModuleSearch.matching(query),
                PageRequest.of(query.page(), query.size(), ModuleSearch.sort(query)));
        return new ModulePage(page.getContent().stream().map(ModuleEntry::toSpec).toList(), page.getTotalElements(),
                query.page(), query.size());
    }

    /** Suppliers with at least one active module, in order: for filters. */
    @Transactional(readOnly = true)
    public List<String> suppliers() {
        return modules.activeSuppliers();
    }

    /** Solver inputs of every active module, as of the latest committed change. */
    public CatalogSnapshot snapshot() {
        return snapshots.current();
    }

    /**
     * @throws InvalidRequestException naming each bad field (flat names: {@code imaxA}, {@code prices})
     * @throws ConflictException       when the supplier already lists this part number
     */
    @Transactional
    public ModuleSpec create(ModuleDefinition definition, String actor) {
        requireValid(definition);
        requireFreeKey(definition, null);
        var entry = new ModuleEntry(definition, clock.instant(), actor);
        saveAndFlush(entry, definition);
        changed();
        return entry.toSpec();
    }

    /**
     * Replaces a module's definition, if nobody changed it since {@code expectedVersion}.
     *
     * @throws StaleEditException when the stored version differs; nothing is written
     */
    @Transactional
    public ModuleSpec update(long id, long expectedVersion, ModuleDefinition definition, String actor) {
        ModuleEntry entry = modules.findById(id).orElseThrow(() -> new NotFoundException(MODULE, id));
        if (entry.getVersion() != expectedVersion) {
            throw new StaleEditException("Module", id, expectedVersion, entry.getVersion());
        }
        requireValid(definition);
        requireFreeKey(definition, id);
        if (entry.toDefinition().equals(definition)) {
            return entry.toSpec();
        }
        entry.apply(definition, clock.instant(), actor);
        saveAndFlush(entry, definition);
        changed();
        return entry.toSpec();
    }

    /** Hides a module from search and the snapshot; it stays readable by id. Archiving twice is harmless. */
    @Transactional
    public ModuleSpec archive(long id, String actor) {
        ModuleEntry entry = modules.findById(id).orElseThrow(() -> new NotFoundException(MODULE, id));
        if (!entry.isArchived()) {
            entry.archive(clock.instant(), actor);
            modules.flush();
            changed();
        }
        return entry.toSpec();
    }

    @Transactional
    public ModuleSpec restore(long id, String actor) {
        ModuleEntry entry = modules.findById(id).orElseThrow(() -> new NotFoundException(MODULE, id));
        if (entry.isArchived()) {
            entry.restore(clock.instant(), actor);
            modules.flush();
            changed();
        }
        return entry.toSpec();
    }

    /** What importing this CSV would change, or its row errors; stores nothing. */
    @Transactional(readOnly = true)
    public ImportReport previewImport(Reader csv) {
        return plan(csv).report(false);
    }

    /**
     * Imports a CSV all or nothing, in one transaction: when any row is bad, nothing is stored and
     * the report lists every error. A row matching a stored module (same supplier and part number)
     * updates it, restoring it if archived; columns the file lacks keep their stored values.
     */
    @Transactional
    public ImportReport importCsv(Reader csv, String actor) {
        ImportPlan plan = plan(csv);
        if (!plan.errors.isEmpty()) {
            return plan.report(false);
        }
        var now = clock.instant();
        var created = new ArrayList<ModuleEntry>();
        for (PlannedRow row : plan.rows) {
            switch (row.change.kind()) {
                case NEW -> created.add(new ModuleEntry(row.definition, now, actor));
                case UPDATED -> {
                    row.existing.apply(row.definition, now, actor);
                    row.existing.restore(now, actor);
                }
                case UNCHANGED -> {
                }
            }
        }
        try {
            modules.saveAll(created);
            modules.flush();
        } catch (DataIntegrityViolationException raced) {
            throw new ConflictException(ModuleText.PART_NUMBER,
                    "another change added one of these part numbers while the file was imported; import it again");
        }
        if (plan.rows.stream().anyMatch(r -> r.change.kind() != ImportReport.Kind.UNCHANGED)) {
            changed();
        }
        var ids = new HashMap<String, Long>();
        created.forEach(e -> ids.put(ModuleCsv.Row.key(e.getSupplier(), e.getPartNumber()), e.getId()));
        return new ImportReport(plan.rows.stream().map(r -> r.change.moduleId() != null ? r.change
                : withId(r.change, ids.get(ModuleCsv.Row.key(r.change.supplier(), r.change.partNumber())))).toList(),
                List.of(), true);
    }

    /** Writes every module (or every active one) as CSV; importing the result changes nothing. */
    @Transactional(readOnly = true)
    public void exportCsv(Writer out, boolean includeArchived) {
        List<ModuleEntry> entries = includeArchived ? modules.findAllByOrderBySupplierAscPartNumberAsc()
                : modules.findByArchivedFalseOrderBySupplierAscPartNumberAsc();
        ModuleCsv.write(entries.stream().map(ModuleEntry::toDefinition).toList(), out);
    }

    /** The CSV header with every documented column and no rows. */
    public String csvTemplate() {
        return ModuleCsv.template();
    }

    private record PlannedRow(ImportReport.RowChange change, ModuleDefinition definition, ModuleEntry existing) {
    }

    private record ImportPlan(List<PlannedRow> rows, List<CsvRowError> errors) {

        ImportReport report(boolean applied) {
            return errors.isEmpty() ? new ImportReport(rows.stream().map(PlannedRow::change).toList(), List.of(), applied)
                    : new ImportReport(List.of(), errors, false);
        }
    }

    private ImportPlan plan(Reader csv) {
        ModuleCsv.Rows read = ModuleCsv.read(csv);
        var errors = new ArrayList<>(read.errors());
        Set<String> suppliers = read.rows().stream().map(r -> r.cells().get(ModuleText.SUPPLIER))
                .filter(s -> s != null && !s.isBlank()).map(String::strip).collect(Collectors.toSet());
        Map<String, ModuleEntry> stored = new HashMap<>();
        if (!suppliers.isEmpty()) {
            modules.findBySupplierIn(suppliers).forEach(e -> stored.put(
                    ModuleCsv.Row.key(e.getSupplier(), e.getPartNumber()), e));
        }
        var rows = new ArrayList<PlannedRow>();
        for (ModuleCsv.Row row : read.rows()) {
            ModuleEntry existing = stored.get(row.key());
            ModuleDefinition base = existing == null ? null : existing.toDefinition();
            ModuleText.Parsed parsed = ModuleText.parse(row.cells(), base);
            if (!parsed.ok()) {
                parsed.problems().forEach(p -> errors.add(new CsvRowError(row.row(), p.field(), p.message())));
                continue;
            }
            ModuleDefinition definition = parsed.definition();
            ImportReport.RowChange change;
            if (existing == null) {
                change = new ImportReport.RowChange(row.row(), definition.supplier(), definition.partNumber(),
                        ImportReport.Kind.NEW, null, List.of());
            } else {
                var changed = new ArrayList<>(changedColumns(base, definition));
                if (existing.isArchived()) {
                    changed.add("archived"); // importing an archived part brings it back
                }
                change = new ImportReport.RowChange(row.row(), definition.supplier(), definition.partNumber(),
                        changed.isEmpty() ? ImportReport.Kind.UNCHANGED : ImportReport.Kind.UPDATED,
                        existing.getId(), changed);
            }
            rows.add(new PlannedRow(change, definition, existing));
        }
        errors.sort(java.util.Comparator.comparingInt(CsvRowError::row));
        return new ImportPlan(rows, errors);
    }

    private static List<String> changedColumns(ModuleDefinition before, ModuleDefinition after) {
        if (before.equals(after)) {
            return List.of();
        }
        Map<String, String> old = ModuleText.cells(before);
        return ModuleText.cells(after).entrySet().stream()
                .filter(e -> !e.getValue().equals(old.get(e.getKey()))).map(Map.Entry::getKey).toList();
    }

    private static ImportReport.RowChange withId(ImportReport.RowChange change, Long id) {
        return new ImportReport.RowChange(change.row(), change.supplier(), change.partNumber(), change.kind(), id,
                change.changedColumns());
    }

    private static void requireValid(ModuleDefinition definition) {
        var problems = ModuleDefinitionCheck.problems(definition);
        if (!problems.isEmpty()) {
            throw new InvalidRequestException(problems);
        }
    }

    private void requireFreeKey(ModuleDefinition definition, Long ownId) {
        modules.findBySupplierAndPartNumber(definition.supplier(), definition.partNumber())
                .filter(other -> !other.getId().equals(ownId))
                .ifPresent(other -> {
                    throw duplicate(definition, other.getId());
                });
    }

    private void saveAndFlush(ModuleEntry entry, ModuleDefinition definition) {
        try {
            modules.saveAndFlush(entry);
        } catch (DataIntegrityViolationException raced) {
            throw duplicate(definition, null);
        }
    }

    private static ConflictException duplicate(ModuleDefinition definition, Long otherId) {
        return new ConflictException(ModuleText.PART_NUMBER, definition.supplier() + " already lists part number "
                + definition.partNumber() + (otherId == null ? "" : " (module " + otherId + ")"));
    }

    private void changed() {
        events.publishEvent(new CatalogChanged(snapshots.bumpRevision()));
    }
}
