package org.chillwright.catalog.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.servlet.http.HttpServletRequest;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Reader;
import java.net.URI;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.security.Principal;
import java.util.List;
import java.util.Set;
import java.util.function.Supplier;
import jakarta.servlet.http.HttpServletResponse;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ImportReport;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.catalog.ModuleSort;
import org.chillwright.catalog.ModuleSpec;
import org.chillwright.catalog.ModuleText;
import org.chillwright.web.FieldProblem;
import org.chillwright.web.InvalidRequestException;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/**
 * The catalog part of the HTTP contract. {@code DELETE} archives (entries are never deleted, so
 * studies and approved lists that name a module keep working); {@code POST .../restore} undoes it.
 */
@RestController
@RequestMapping("/api/v1/modules")
@Tag(name = "Catalog", description = "The team's modules: search, read, add, change, archive; CSV import and export")
class ModuleApiController {

    static final String TEXT_CSV = "text/csv";
    private static final String WRITERS = "hasAnyRole('ENGINEER','ADMIN')";
    private static final Set<String> RATING_FIELDS = Set.of("imaxA", "vmaxV", "qmaxW", "dtmaxK", "hotSideC",
            "ratingsMethod", "testAtmosphere");
    private static final Set<String> CONSTRUCTION_FIELDS = Set.of("couples", "legAreaMm2", "legAreaNMm2",
            "legLengthMm", "seebeckPVPerK", "seebeckNVPerK", "resistivityPOhmM", "resistivityNOhmM",
            "conductivityPWPerMK", "conductivityNWPerMK", "contactResistivityOhmM2");

    private final CatalogService catalog;

    ModuleApiController(CatalogService catalog) {
        this.catalog = catalog;
    }

    @GetMapping
    @Operation(operationId = "searchModules", summary = "Search the catalog, one page at a time")
    ModuleListResponse search(@RequestParam(required = false) String q,
                              @RequestParam(required = false) String supplier,
                              @RequestParam(required = false) Lifecycle lifecycle,
                              @RequestParam(required = false) Double imaxMinA, @RequestParam(required = false) Double imaxMaxA,
                              @RequestParam(required = false) Double qmaxMinW, @RequestParam(required = false) Double qmaxMaxW,
                              @RequestParam(required = false) Double dtmaxMinK, @RequestParam(required = false) Double dtmaxMaxK,
                              @RequestParam(defaultValue = "PART") ModuleSort sort,
                              @RequestParam(defaultValue = "false") boolean descending,
                              @RequestParam(defaultValue = "false") boolean includeArchived,
                              @RequestParam(defaultValue = "0") int page,
                              @RequestParam(defaultValue = "" + ModuleQuery.DEFAULT_SIZE) int size) {
        var result = catalog.search(new ModuleQuery(q, supplier, lifecycle, imaxMinA, imaxMaxA, qmaxMinW, qmaxMaxW,
                dtmaxMinK, dtmaxMaxK, includeArchived, sort, descending, page, size));
        return new ModuleListResponse(result.items().stream().map(ModuleResponse::of).toList(), result.total(),
                result.page(), result.size());
    }

    @GetMapping("/{id}")
    @Operation(operationId = "getModule", summary = "One module, with what the physics engine derives from it")
    ModuleResponse get(@PathVariable long id) {
        return ModuleResponse.of(catalog.get(id));
    }

    @PostMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    @ResponseStatus(HttpStatus.CREATED) // what the ResponseEntity below answers; said here for the API document
    @PreAuthorize(WRITERS)
    @Operation(operationId = "createModule", summary = "Add a module by its ratings or its construction")
    ResponseEntity<ModuleResponse> create(@RequestBody ModuleRequest request, Principal who) {
        ModuleSpec created = withJsonFieldNames(() -> catalog.create(request.toDefinition(), who.getName()));
        return ResponseEntity.created(URI.create("/api/v1/modules/" + created.id())).body(ModuleResponse.of(created));
    }

    @PutMapping(path = "/{id}", consumes = MediaType.APPLICATION_JSON_VALUE)
    @PreAuthorize(WRITERS)
    @Operation(operationId = "updateModule", summary = "Change a module; send the version you read")
    ModuleResponse update(@PathVariable long id, @RequestBody ModuleRequest request, Principal who) {
        if (request.version() == null) {
            throw new InvalidRequestException("version", "is required: send the version you read, so that a "
                    + "change made meanwhile by someone else is not overwritten");
        }
        return ModuleResponse.of(withJsonFieldNames(
                () -> catalog.update(id, request.version(), request.toDefinition(), who.getName())));
    }

    /** Archives the module (entries are never deleted) and returns it. */
    @DeleteMapping("/{id}")
    @PreAuthorize(WRITERS)
    @Operation(operationId = "archiveModule", summary = "Archive a module; it stays, so lists and studies "
            + "that name it keep working")
    ModuleResponse archive(@PathVariable long id, Principal who) {
        return ModuleResponse.of(catalog.archive(id, who.getName()));
    }

    @PostMapping("/{id}/restore")
    @PreAuthorize(WRITERS)
    @Operation(operationId = "restoreModule", summary = "Bring an archived module back")
    ModuleResponse restore(@PathVariable long id, Principal who) {
        return ModuleResponse.of(catalog.restore(id, who.getName()));
    }

    /**
     * Imports a CSV all or nothing. With {@code dryRun=true} only reports what would change. Any bad
     * row: 400 with {@code errors: [{row, column, field, message}]} and nothing stored.
     */
    @PostMapping(path = "/import", consumes = TEXT_CSV)
    @PreAuthorize(WRITERS)
    @Operation(operationId = "importModules", summary = "Import a CSV of modules, all or nothing; dryRun=true "
            + "only reports what would change")
    @ApiResponse(responseCode = "200", description = "What was (or, on a dry run, would be) stored, row by row",
            content = @Content(schema = @Schema(implementation = ImportResponse.class)))
    ResponseEntity<Object> importCsv(HttpServletRequest request, @RequestParam(defaultValue = "false") boolean dryRun,
                                     Principal who) throws IOException {
        ImportReport report;
        try (Reader csv = new InputStreamReader(request.getInputStream(), charset(request))) {
            report = dryRun ? catalog.previewImport(csv) : catalog.importCsv(csv, who.getName());
        }
        if (!report.ok()) {
            var problem = ProblemDetail.forStatusAndDetail(HttpStatus.BAD_REQUEST, report.errors().size()
                    + " problem(s) in the file; nothing was stored");
            problem.setTitle("Invalid CSV");
            problem.setProperty("errors", report.errors().stream().map(e -> new CsvProblem(e.row(), e.column(),
                    "row " + e.row() + (e.column().isEmpty() ? "" : " " + e.column()), e.message())).toList());
            return ResponseEntity.badRequest().contentType(MediaType.APPLICATION_PROBLEM_JSON).body(problem);
        }
        return ResponseEntity.ok(new ImportResponse(report.applied(), report.count(ImportReport.Kind.NEW),
                report.count(ImportReport.Kind.UPDATED), report.count(ImportReport.Kind.UNCHANGED), report.changes()));
    }

    /** One bad cell; {@code field} repeats row and column for clients that only read {field, message}. */
    record CsvProblem(int row, String column, String field, String message) {
    }

    record ImportResponse(boolean applied, long created, long updated, long unchanged,
                          List<ImportReport.RowChange> rows) {
    }

    @GetMapping(path = "/export", produces = TEXT_CSV)
    @Operation(operationId = "exportModules", summary = "The catalog as CSV, in the columns the import reads")
    void export(@RequestParam(defaultValue = "false") boolean includeArchived, HttpServletResponse response)
            throws IOException {
        response.setContentType(TEXT_CSV + ";charset=UTF-8");
        response.setHeader("Content-Disposition", "attachment; filename=\"catalog.csv\"");
        var out = new OutputStreamWriter(response.getOutputStream(), StandardCharsets.UTF_8);
        catalog.exportCsv(out, includeArchived);
        out.flush();
    }

    @GetMapping(path = "/template", produces = TEXT_CSV)
    @Operation(operationId = "getModuleCsvTemplate", summary = "An empty CSV with every column the import reads")
    ResponseEntity<String> template() {
        return ResponseEntity.ok().contentType(MediaType.parseMediaType(TEXT_CSV + ";charset=UTF-8"))
                .header("Content-Disposition", "attachment; filename=\"catalog-template.csv\"")
                .body(catalog.csvTemplate());
    }

    private static Charset charset(HttpServletRequest request) {
        String name = request.getCharacterEncoding();
        try {
            return name == null ? StandardCharsets.UTF_8 : Charset.forName(name);
        } catch (IllegalArgumentException unknown) {
            throw new InvalidRequestException("Content-Type", "names an unknown charset '" + name + "'; send UTF-8");
        }
    }

    /** The service names fields as the CSV does; the JSON nests them under ratings or construction. */
    private static <T> T withJsonFieldNames(Supplier<T> call) {
        try {
            return call.get();
        } catch (InvalidRequestException e) {
            throw new InvalidRequestException(e.problems().stream().map(p -> new FieldProblem(jsonField(p.field()),
                    p.message())).toList());
        }
    }

    private static String jsonField(String field) {
        if (field.equals("ratingsMethod")) {
            return "ratings.method";
        }
        if (RATING_FIELDS.contains(field)) {
            return "ratings." + field;
        }
        if (CONSTRUCTION_FIELDS.contains(field)) {
            return "construction." + field;
        }
        return field.equals(ModuleText.ROUTE) ? "ratings" : field;
    }
}
