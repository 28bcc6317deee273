package com.wayledger.balance;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/** The balancing page on the demo bakery board: preview, apply through the form, refusals. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class BalancePageIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  @Test
  void theFormShownOnThePageAppliesThePlanAndTheBoardComesWithinItsLimit() throws Exception {
    long bakery = board("KB1");
    String page =
        mvc.perform(get("/boards/{id}/balance", bakery).with(editor()))
            .andExpect(status().isOk())
            .andExpect(content().string(containsString("Proved optimal")))
            .andReturn()
            .getResponse()
            .getContentAsString();
    String placements = hidden(page, "placements");
    String version = hidden(page, "version");
    mvc.perform(
            post("/boards/{id}/balance/apply", bakery)
                .param("placements", placements)
                .param("version", version)
                .param("reason", "WO-5")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(flash().attributeExists("applied"));
    String after =
        mvc.perform(get("/boards/{id}", bakery).with(viewer()))
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(after).contains("within the board").doesNotContain("beyond the board");
  }

  @Test
  void malformedPlanChangesNothing() throws Exception {
    long bakery = board("KB1");
    long before =
        jdbc.sql("SELECT version FROM board WHERE id = ?").param(bakery).query(Long.class).single();
    mvc.perform(
            post("/boards/{id}/balance/apply", bakery)
                .param("placements", "12:x:L9")
                .param("version", String.valueOf(before))
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(flash().attribute("problem", "balance.plan.malformed"));
    assertThat(
            jdbc.sql("SELECT version FROM board WHERE id = ?")
                .param(bakery)
                .query(Long.class)
                .single())
        .isEqualTo(before);
  }

  @Test
  void viewerCannotApplyAPlan() throws Exception {
    mvc.perform(
            post("/boards/{id}/balance/apply", board("KB1"))
                .param("placements", "1:1:L1")
                .param("version", "0")
                .with(viewer())
                .with(csrf()))
        .andExpect(status().isForbidden());
  }

  @Test
  void aSinglePhaseBoardGetsAClearMessageNotAnError() throws Exception {
    mvc.perform(get("/boards/{id}/balance", board("FLAT-1")).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("Note:")));
  }

  private long board(String reference) {
    return jdbc.sql("SELECT id FROM board WHERE reference = ?")
        .param(reference)
        .query(Long.class)
        .single();
  }

  private static String hidden(String page, String name) {
    Matcher m = Pattern.compile("name=\"" + name + "\" value=\"([^\"]*)\"").matcher(page);
    assertThat(m.find()).as("hidden field %s on the page", name).isTrue();
    return m.group(1);
  }
}
