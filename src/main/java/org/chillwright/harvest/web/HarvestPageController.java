package org.chillwright.harvest.web;

import jakarta.validation.Valid;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.harvest.HarvestCase;
import org.chillwright.harvest.HarvestObjective;
import org.chillwright.harvest.HarvestService;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.TemperatureUnit;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.util.MultiValueMap;
import org.springframework.validation.BindingResult;
import org.springframework.validation.FieldError;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.util.UriComponentsBuilder;

/** Harvest case → ranking → design. Each page is a GET whose query string is the case, so links can be shared. */
@Controller
@RequestMapping("/harvest")
class HarvestPageController {

    /** Query parameters that pick a design rather than describe the case. */
    private static final Set<String> DESIGN_PARAMETERS = Set.of("moduleId", "series", "parallel");

    /** A starting point a newcomer can rank at once: a 90 °C hot-water pipe, 25 °C air, a finned sink. */
    private static final String EXAMPLE = "temperatureUnit=C&hotSource=90&coldSink=25&hotResistanceKPerW=0.3"
            + "&coldResistanceKPerW=0.5&maxModules=4&objective=POWER&minLoadVoltageV=0&costQuantity=1"
            + "&lifecycles=ACTIVE&lifecycles=NOT_FOR_NEW_DESIGNS&lifecycles=LAST_TIME_BUY";

    private final HarvestService harvest;

    HarvestPageController(HarvestService harvest) {
        this.harvest = harvest;
    }

    @ModelAttribute
    void choices(Model model) {
        model.addAttribute("temperatureUnits", TemperatureUnit.values());
        model.addAttribute("objectives", HarvestObjective.values());
        model.addAttribute("allLifecycles", Lifecycle.values());
    }

    @GetMapping
    String newCase(Model model) {
        return formPage(model, UriComponentsBuilder.newInstance().query(EXAMPLE).build().getQueryParams(), Map.of());
    }

    /** The form filled with a case's values, to change and rank again. */
    @GetMapping("/edit")
    String editCase(@RequestParam MultiValueMap<String, String> values, Model model) {
        return formPage(model, values, Map.of());
    }

    @GetMapping("/rank")
    String rank(@Valid @ModelAttribute("harvestForm") HarvestForm form, BindingResult errors,
                @RequestParam MultiValueMap<String, String> values, Model model) {
        var problems = problems(form, errors);
        if (!problems.isEmpty()) {
            return formPage(model, values, problems);
        }
        model.addAttribute("result", harvest.rank(form.toSpec()));
        caseModel(model, form, values);
        return "harvest/ranking";
    }

    @GetMapping("/design")
    String design(@Valid @ModelAttribute("harvestForm") HarvestForm form, BindingResult errors,
                  @RequestParam long moduleId, @RequestParam(defaultValue = "1") int series,
                  @RequestParam(defaultValue = "1") int parallel,
                  @RequestParam MultiValueMap<String, String> values, Model model) {
        var problems = problems(form, errors);
        if (!problems.isEmpty()) {
            return formPage(model, values, problems);
        }
        if (series < 1 || parallel < 1 || series * parallel > HarvestCase.MAX_MODULES) {
            throw new InvalidRequestException("series", "a design has 1 to " + HarvestCase.MAX_MODULES
                    + " modules, was " + series + " in series × " + parallel + " in parallel");
        }
        var detail = harvest.detail(form.toSpec(), moduleId, series, parallel);
        model.addAttribute("detail", detail);
        model.addAttribute("chart", HarvestChartData.of(detail.curves()));
        caseModel(model, form, values);
        return "harvest/design";
    }

    private static void caseModel(Model model, HarvestForm form, MultiValueMap<String, String> values) {
        model.addAttribute("values", values);
        model.addAttribute("query", caseQuery(values));
        model.addAttribute("view", new HarvestView(form.temperatureUnit()));
        model.addAttribute("harvestCase", form.toSpec().harvestCase());
    }

    /** Binding and validation messages by field, then the cross-field ones, the first per field. */
    private static Map<String, String> problems(HarvestForm form, BindingResult errors) {
        var messages = new LinkedHashMap<String, String>();
        errors.getFieldErrors().forEach(e -> messages.putIfAbsent(e.getField(), message(e)));
        if (!errors.hasErrors()) {
            form.crossFieldProblems().forEach(messages::putIfAbsent);
        }
        return messages;
    }

    private static String message(FieldError error) {
        return error.isBindingFailure() ? "enter a number (with a . for decimals), not '" + error.getRejectedValue() + "'"
                : error.getDefaultMessage();
    }

    /** The form page with what the person typed, as typed, and a message beside each bad field. */
    private static String formPage(Model model, MultiValueMap<String, String> values, Map<String, String> errors) {
        model.addAttribute("values", values);
        model.addAttribute("errors", errors);
        return "harvest/new";
    }

    /** The case's own parameters as a query string, for links between the ranking and its designs. */
    static String caseQuery(MultiValueMap<String, String> values) {
        return values.entrySet().stream().filter(e -> !DESIGN_PARAMETERS.contains(e.getKey()))
                .flatMap(e -> e.getValue().stream().map(v -> encode(e.getKey()) + "=" + encode(v)))
                .collect(Collectors.joining("&"));
    }

    private static String encode(String text) {
        return URLEncoder.encode(text, StandardCharsets.UTF_8);
    }
}
