package org.chillwright.selection.web;

import jakarta.validation.Valid;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.selection.CandidateDetail;
import org.chillwright.selection.Objective;
import org.chillwright.selection.RankingCsv;
import org.chillwright.selection.RankingReport;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.chillwright.selection.SelectionService;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.PowerUnit;
import org.chillwright.web.TemperatureUnit;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import java.util.LinkedHashMap;
import org.springframework.util.MultiValueMap;
import org.springframework.validation.BindingResult;
import org.springframework.validation.FieldError;
import org.springframework.web.util.UriComponentsBuilder;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;

/** Case → ranking → candidate → comparison. Each page is a GET whose query string is the case. */
@Controller
@RequestMapping("/cases")
class SelectionPageController {

    static final int MAX_COMPARED = 4;
    private static final Pattern DESIGN = Pattern.compile("(\\d+):(\\d)x(\\d)");

    /** Candidates whose curves the PDF report draws. */
    static final int REPORT_CURVES = 3;

    private final SelectionService selection;
    private final ApprovedListService lists;
    private final java.time.Clock clock;

    SelectionPageController(SelectionService selection, ApprovedListService lists, java.time.Clock clock) {
        this.selection = selection;
        this.lists = lists;
        this.clock = clock;
    }

    @ModelAttribute
    void choices(Model model) {
        model.addAttribute("temperatureUnits", TemperatureUnit.values());
        model.addAttribute("powerUnits", PowerUnit.values());
        model.addAttribute("objectives", Objective.values());
        model.addAttribute("allLifecycles", Lifecycle.values());
        model.addAttribute("approvedLists", lists.lists());
    }

    @GetMapping("/new")
    String newCase(Model model) {
        return formPage(model, UriComponentsBuilder.newInstance().query(CaseForm.example().toQuery()).build()
                .getQueryParams(), null);
    }

    /** The form filled with a case's values, to change and rank again. */
    @GetMapping("/edit")
    String editCase(@RequestParam MultiValueMap<String, String> values, Model model) {
        return formPage(model, values, null);
    }

    /**
     * The form page with what the person typed and a message beside each bad field. Values are the raw
     * strings, so a mistyped number is shown as typed rather than lost.
     */
    private static String formPage(Model model, MultiValueMap<String, String> values, BindingResult errors) {
        var messages = new LinkedHashMap<String, String>();
        if (errors != null) {
            errors.getFieldErrors().forEach(e -> messages.putIfAbsent(e.getField(), message(e)));
            errors.getGlobalErrors().forEach(e -> messages.putIfAbsent(e.getObjectName(), e.getDefaultMessage()));
        }
        model.addAttribute("values", values);
        model.addAttribute("errors", messages);
        return "cases/new";
    }

    private static String message(FieldError error) {
        return error.isBindingFailure() ? "enter a number (with a . for decimals), not '" + error.getRejectedValue() + "'"
                : error.getDefaultMessage();
    }

    @GetMapping("/rank")
    String rank(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors,
                @RequestParam MultiValueMap<String, String> values, Model model) {
        if (errors.hasErrors()) {
            return formPage(model, values, errors);
        }
        model.addAttribute("result", selection.rank(form.toSpec()));
        model.addAttribute("values", values);
        model.addAttribute("query", form.toQuery());
        model.addAttribute("view", new CaseView(form));
        return "cases/ranking";
    }

    @GetMapping(value = "/rank.csv", produces = "text/csv")
    ResponseEntity<String> rankingCsv(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors) {
        requireValid(errors);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"chillwright-ranking.csv\"")
                .contentType(new MediaType("text", "csv", java.nio.charset.StandardCharsets.UTF_8))
                .body(RankingCsv.of(selection.rank(form.toSpec())));
    }

    @GetMapping(value = "/report.pdf", produces = MediaType.APPLICATION_PDF_VALUE)
    ResponseEntity<byte[]> report(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors) {
        requireValid(errors);
        var spec = form.toSpec();
        var result = selection.rank(spec);
        var top = result.candidates().stream().limit(REPORT_CURVES)
                .map(row -> selection.detail(spec, row.design().moduleId(), row.design().seriesCount(),
                        row.design().parallelCount()))
                .toList();
        byte[] pdf = RankingReport.of(result, new CaseView(form).lines(), top, clock.instant());
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"chillwright-report.pdf\"")
                .contentType(MediaType.APPLICATION_PDF).body(pdf);
    }

    /** Downloads have no form to re-render: bad input is a 400 naming the fields. */
    private static void requireValid(BindingResult errors) {
        if (errors.hasErrors()) {
            throw new InvalidRequestException(errors.getFieldErrors().stream()
                    .map(e -> new org.chillwright.web.FieldProblem(e.getField(), message(e))).toList());
        }
    }

    @GetMapping("/candidate")
    String candidate(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors,
                     @RequestParam long moduleId, @RequestParam(defaultValue = "1") int series,
                     @RequestParam(defaultValue = "1") int parallel,
                     @RequestParam MultiValueMap<String, String> values, Model model) {
        if (errors.hasErrors()) {
            return formPage(model, values, errors);
        }
        CandidateDetail detail = selection.detail(form.toSpec(), moduleId, series, parallel);
        model.addAttribute("detail", detail);
        model.addAttribute("query", form.toQuery());
        model.addAttribute("view", new CaseView(form));
        model.addAttribute("chart", ChartData.of(detail));
        return "cases/candidate";
    }

    @GetMapping("/compare")
    String compare(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors,
                   @RequestParam(name = "design", required = false) List<String> designs,
                   @RequestParam MultiValueMap<String, String> values, Model model) {
        if (errors.hasErrors()) {
            return formPage(model, values, errors);
        }
        if (designs == null || designs.isEmpty()) {
            throw new InvalidRequestException("design", "tick at least one candidate to compare");
        }
        if (designs.size() > MAX_COMPARED) {
            throw new InvalidRequestException("design", "compare at most " + MAX_COMPARED + " candidates at once");
        }
        var spec = form.toSpec();
        var details = new ArrayList<CandidateDetail>();
        for (String design : designs) {
            var m = DESIGN.matcher(design);
            if (!m.matches()) {
                throw new InvalidRequestException("design", "expected moduleId:SERIESxPARALLEL, got '" + design + "'");
            }
            details.add(selection.detail(spec, Long.parseLong(m.group(1)), Integer.parseInt(m.group(2)),
                    Integer.parseInt(m.group(3))));
        }
        model.addAttribute("details", details);
        model.addAttribute("comparison", selection.purchasingView(spec, details));
        model.addAttribute("query", form.toQuery());
        model.addAttribute("view", new CaseView(form));
        return "cases/compare";
    }
}
