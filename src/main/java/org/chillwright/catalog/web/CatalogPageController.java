package org.chillwright.catalog.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.servlet.http.HttpSession;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.security.Principal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.EntryRoute;
import org.chillwright.catalog.ImportReport;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.catalog.ModuleSort;
import org.chillwright.catalog.ModuleSpec;
import org.chillwright.catalog.ModuleText;
import org.chillwright.catalog.PerformanceCurves;
import org.chillwright.catalog.TestAtmosphere;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.web.ConflictException;
import org.chillwright.web.FieldProblem;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.StaleEditException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import tools.jackson.databind.ObjectMapper;

/** The catalog pages: search, module detail with curves, create and edit forms, CSV import and export. */
@Controller
@RequestMapping("/catalog")
class CatalogPageController {

    private static final String WRITERS = "hasAnyRole('ENGINEER','ADMIN')";
    private static final String PENDING_IMPORT = "catalog.pendingImport";
    /** Preview tables show at most this many rows; the counts cover the whole file. */
    private static final int PREVIEW_ROWS = 200;
    private static final List<String> FILTERS = List.of("q", "supplier", "lifecycle", "imaxMinA", "imaxMaxA",
            "qmaxMinW", "qmaxMaxW", "dtmaxMinK", "dtmaxMaxK", "sort", "desc");

    private static final List<Range> RANGES = List.of(new Range("Imax (A)", "imaxMinA", "imaxMaxA"),
            new Range("Qmax (W)", "qmaxMinW", "qmaxMaxW"), new Range("ΔTmax (K)", "dtmaxMinK", "dtmaxMaxK"));

    /** A from–to filter of the listing and its two parameter names. */
    record Range(String label, String min, String max) {
    }

    private final CatalogService catalog;
    private final ApprovedListService lists;
    private final ObjectMapper json;

    CatalogPageController(CatalogService catalog, ApprovedListService lists, ObjectMapper json) {
        this.catalog = catalog;
        this.lists = lists;
        this.json = json;
    }

    @GetMapping
    String list(@RequestParam Map<String, String> params, Model model) {
        var errors = new LinkedHashMap<String, String>();
        var query = new ModuleQuery(params.get("q"), params.get("supplier"),
                choice(params, "lifecycle", Lifecycle.class, errors),
                number(params, "imaxMinA", errors), number(params, "imaxMaxA", errors),
                number(params, "qmaxMinW", errors), number(params, "qmaxMaxW", errors),
                number(params, "dtmaxMinK", errors), number(params, "dtmaxMaxK", errors), false,
                choice(params, "sort", ModuleSort.class, errors), "true".equals(params.get("desc")),
                whole(params.get("page")), ModuleQuery.DEFAULT_SIZE);
        var filters = new LinkedHashMap<String, String>();
        FILTERS.forEach(f -> filters.put(f, params.getOrDefault(f, "").strip()));
        model.addAttribute("result", catalog.search(errors.isEmpty() ? query : ModuleQuery.all()));
        model.addAttribute("query", query);
        model.addAttribute("filters", filters);
        model.addAttribute("errors", errors);
        model.addAttribute("suppliers", catalog.suppliers());
        model.addAttribute("lifecycles", Lifecycle.values());
        model.addAttribute("sorts", ModuleSort.values());
        model.addAttribute("ranges", RANGES);
        return "catalog/list";
    }

    @GetMapping("/{id}")
    String detail(@PathVariable long id, Model model) {
        ModuleSpec module = catalog.get(id);
        model.addAttribute("module", module);
        model.addAttribute("d", module.definition());
        model.addAttribute("curvesJson", curvesJson(PerformanceCurves.of(module)));
        model.addAttribute("placements", lists.placementsOf(id));
        return "catalog/detail";
    }

    @GetMapping("/new")
    @PreAuthorize(WRITERS)
    String newForm(@RequestParam(defaultValue = "RATINGS") EntryRoute route, Model model) {
        var values = new LinkedHashMap<String, String>();
        values.put(ModuleText.ROUTE, route.name());
        values.put("hotSideC", "25");
        values.put("lifecycle", Lifecycle.ACTIVE.name());
        return form(model, values, Map.of(), null, null);
    }

    @PostMapping("/new")
    @PreAuthorize(WRITERS)
    String create(@RequestParam Map<String, String> params, Principal who, Model model) {
        var parsed = ModuleText.parse(params, null);
        if (!parsed.ok()) {
            return form(model, params, messages(parsed.problems()), null, null);
        }
        try {
            return "redirect:/catalog/" + catalog.create(parsed.definition(), who.getName()).id();
        } catch (ConflictException e) {
            return form(model, params, Map.of(ModuleText.PART_NUMBER, e.getMessage()), null, null);
        }
    }

    @GetMapping("/{id}/edit")
    @PreAuthorize(WRITERS)
    String editForm(@PathVariable long id, Model model) {
        ModuleSpec module = catalog.get(id);
        return form(model, ModuleText.cells(module.definition()), Map.of(), module, null);
    }

    @PostMapping("/{id}/edit")
    @PreAuthorize(WRITERS)
    String update(@PathVariable long id, @RequestParam long version, @RequestParam Map<String, String> params,
                  Principal who, Model model) {
        ModuleSpec current = catalog.get(id);
        var parsed = ModuleText.parse(params, null);
        if (!parsed.ok()) {
            return form(model, params, messages(parsed.problems()), current, null);
        }
        try {
            catalog.update(id, version, parsed.definition(), who.getName());
            return "redirect:/catalog/" + id;
        } catch (StaleEditException | OptimisticLockingFailureException e) {
            ModuleSpec now = catalog.get(id);
            return form(model, ModuleText.cells(now.definition()), Map.of(), now, conflicts(params, now.definition()));
        } catch (ConflictException e) {
            return form(model, params, Map.of(ModuleText.PART_NUMBER, e.getMessage()), current, null);
        } catch (InvalidRequestException e) {
            return form(model, params, messages(e.problems()), current, null);
        }
    }

    @PostMapping("/{id}/archive")
    @PreAuthorize(WRITERS)
    String archive(@PathVariable long id, Principal who, RedirectAttributes redirect) {
        catalog.archive(id, who.getName());
        redirect.addFlashAttribute("notice", "Archived: the module is hidden from search and rankings, "
                + "and stays readable here.");
        return "redirect:/catalog/" + id;
    }

    @PostMapping("/{id}/restore")
    @PreAuthorize(WRITERS)
    String restore(@PathVariable long id, Principal who, RedirectAttributes redirect) {
        catalog.restore(id, who.getName());
        redirect.addFlashAttribute("notice", "Restored: the module is back in search and rankings.");
        return "redirect:/catalog/" + id;
    }

    @GetMapping("/import")
    @PreAuthorize(WRITERS)
    String importForm(Model model) {
        model.addAttribute("columns", ModuleText.COLUMNS);
        return "catalog/import";
    }

    @PostMapping("/import")
    @PreAuthorize(WRITERS)
    String preview(@RequestParam("file") MultipartFile file, HttpSession session, Model model) throws IOException {
        model.addAttribute("columns", ModuleText.COLUMNS);
        if (file.isEmpty()) {
            model.addAttribute("fileError", "Choose a CSV file to upload.");
            return "catalog/import";
        }
        String csv = new String(file.getBytes(), StandardCharsets.UTF_8);
        ImportReport report = catalog.previewImport(new StringReader(csv));
        var pending = new PendingImport(UUID.randomUUID().toString(), file.getOriginalFilename(), csv);
        if (report.ok()) {
            session.setAttribute(PENDING_IMPORT, pending);
        } else {
            session.removeAttribute(PENDING_IMPORT);
        }
        return report(model, report, pending);
    }

    @PostMapping("/import/apply")
    @PreAuthorize(WRITERS)
    String apply(@RequestParam String previewId, HttpSession session, Principal who, Model model) {
        model.addAttribute("columns", ModuleText.COLUMNS);
        if (!(session.getAttribute(PENDING_IMPORT) instanceof PendingImport pending) || !previewId.equals(pending.previewId())) {
            model.addAttribute("fileError", "That preview has expired: upload the file again.");
            return "catalog/import";
        }
        session.removeAttribute(PENDING_IMPORT);
        return report(model, catalog.importCsv(new StringReader(pending.csv()), who.getName()), pending);
    }

    @GetMapping("/export.csv")
    void export(HttpServletResponse response) throws IOException {
        csvDownload(response, "catalog.csv");
        var out = new OutputStreamWriter(response.getOutputStream(), StandardCharsets.UTF_8);
        catalog.exportCsv(out, false);
        out.flush();
    }

    @GetMapping("/template.csv")
    void template(HttpServletResponse response) throws IOException {
        csvDownload(response, "catalog-template.csv");
        response.getWriter().write(catalog.csvTemplate());
    }

    private static void csvDownload(HttpServletResponse response, String name) {
        response.setContentType("text/csv;charset=UTF-8");
        response.setHeader("Content-Disposition", "attachment; filename=\"" + name + "\"");
    }

    private String report(Model model, ImportReport report, PendingImport pending) {
        model.addAttribute("report", report);
        model.addAttribute("pending", pending);
        model.addAttribute("shownChanges", report.changes().stream()
                .filter(c -> c.kind() != ImportReport.Kind.UNCHANGED).limit(PREVIEW_ROWS).toList());
        model.addAttribute("shownErrors", report.errors().stream().limit(PREVIEW_ROWS).toList());
        return "catalog/import";
    }

    private String form(Model model, Map<String, String> values, Map<String, String> errors, ModuleSpec editing,
                        List<Conflict> conflicts) {
        var shown = new LinkedHashMap<String, String>();
        ModuleText.COLUMNS.forEach(c -> shown.put(c, values.getOrDefault(c, "")));
        if (shown.get(ModuleText.ROUTE).isEmpty()) {
            shown.put(ModuleText.ROUTE, EntryRoute.RATINGS.name());
        }
        model.addAttribute("cells", shown);
        model.addAttribute("errors", errors);
        model.addAttribute("editing", editing);
        model.addAttribute("conflicts", conflicts);
        model.addAttribute("rated", EntryRoute.RATINGS.name().equalsIgnoreCase(shown.get(ModuleText.ROUTE)));
        model.addAttribute("methods", RatingsMethod.values());
        model.addAttribute("atmospheres", TestAtmosphere.values());
        model.addAttribute("lifecycles", Lifecycle.values());
        return "catalog/form";
    }

    /** One field where the submitted edit and the value stored meanwhile differ. */
    record Conflict(String field, String yours, String stored) {
    }

    private static List<Conflict> conflicts(Map<String, String> submitted, ModuleDefinition stored) {
        var conflicts = new ArrayList<Conflict>();
        ModuleText.cells(stored).forEach((column, value) -> {
            String yours = submitted.getOrDefault(column, "").strip();
            if (submitted.containsKey(column) && !yours.equals(value)) {
                conflicts.add(new Conflict(column, yours, value));
            }
        });
        return conflicts;
    }

    private static Map<String, String> messages(List<FieldProblem> problems) {
        var messages = new LinkedHashMap<String, String>();
        problems.forEach(p -> messages.merge(p.field(), p.message(), (a, b) -> a + "; " + b));
        return messages;
    }

    private String curvesJson(PerformanceCurves curves) {
        var series = new ArrayList<Map<String, Object>>();
        for (int c = 0; c < curves.deltaTK().length; c++) {
            var one = new LinkedHashMap<String, Object>();
            one.put("deltaTK", curves.deltaTK()[c]);
            one.put("coldSideHeatW", finiteOrNull(curves.coldSideHeatW()[c]));
            one.put("cop", finiteOrNull(curves.cop()[c]));
            series.add(one);
        }
        var data = new LinkedHashMap<String, Object>();
        data.put("hotSideC", org.chillwright.physics.Units.celsiusFromKelvin(curves.hotSideK()));
        data.put("currentA", curves.currentA());
        data.put("curves", series);
        return json.writeValueAsString(data);
    }

    private static List<Double> finiteOrNull(double[] values) {
        return Arrays.stream(values).mapToObj(v -> Double.isFinite(v) ? v : null).toList();
    }

    private static Double number(Map<String, String> params, String name, Map<String, String> errors) {
        String text = params.getOrDefault(name, "").strip();
        if (text.isEmpty()) {
            return null;
        }
        String problem = ModuleText.numberProblem(text);
        if (problem != null) {
            errors.put(name, problem);
            return null;
        }
        return Double.valueOf(text);
    }

    private static <E extends Enum<E>> E choice(Map<String, String> params, String name, Class<E> type,
                                                Map<String, String> errors) {
        String text = params.getOrDefault(name, "").strip();
        if (text.isEmpty()) {
            return null;
        }
        try {
            return Enum.valueOf(type, text);
        } catch (IllegalArgumentException e) {
            errors.put(name, "is not one of the offered choices, was '" + text + "'");
            return null;
        }
    }

    private static int whole(String text) {
        return text != null && text.matches("\\d{1,6}") ? Integer.parseInt(text) : 0;
    }
}
