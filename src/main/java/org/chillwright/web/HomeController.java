package org.chillwright.web;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

@Controller
class HomeController {

    @GetMapping("/")
    String home() {
        return "home";
    }

    /** The equations used and their published sources. */
    @GetMapping("/method")
    String method() {
        return "method";
    }
}
