package org.chillwright.catalog.web;

import static org.hamcrest.Matchers.allOf;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.Set;
import org.chillwright.account.Role;
import org.chillwright.approval.Actor;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/** A module's catalog page names the approved part lists it is on and its state there. */
@SpringBootTest
@AutoConfigureMockMvc
class CatalogPageShowsListsTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    CatalogService catalog;
    @Autowired
    ApprovedListService lists;

    @Test
    void moduleOnAListShowsTheListAndItsState() throws Exception {
        TestCatalog.ensure(catalog);
        long id = catalog.search(ModuleQuery.text("TMA-TINY")).items().get(0).id();
        var engineer = new Actor("eng-catalog-page", Set.of(Role.ENGINEER));
        var list = lists.create("Sensor heads " + System.nanoTime(), null, engineer);
        lists.propose(list.id(), id, "for the small head", engineer);
        mvc.perform(get("/catalog/" + id)).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("Approved part lists"),
                        containsString(list.name()), containsString("PROPOSED"))));
    }
}
