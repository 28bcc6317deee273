package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * The main menu, the admin link and the edit controls follow the per-request decisions
 * (system.PagePermissions) as they followed the security expressions they replaced, on pages and on
 * the error pages that exception handlers render.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class PagePermissionsIntegrationTests {

  private static final String USERS_LINK = "href=\"/admin/users\"";
  private static final String NEW_SITE_LINK = "href=\"/sites/new\"";
  private static final String SIGN_OUT = "action=\"/logout\"";

  @Autowired MockMvc mvc;

  /** Viewer: menu only; editor: the edit controls too; admin: both, through the hierarchy. */
  @ParameterizedTest
  @CsvSource({"VIEWER, false, false", "EDITOR, true, false", "ADMIN, true, true"})
  void eachRoleSeesTheMenuAndOnlyTheControlsItMayUse(String role, boolean edits, boolean admin)
      throws Exception {
    String page = html(get("/sites").with(user(role.toLowerCase()).roles(role)), 200);
    assertThat(page).contains(SIGN_OUT);
    assertThat(page.contains(NEW_SITE_LINK)).as("the new site link").isEqualTo(edits);
    assertThat(page.contains(USERS_LINK)).as("the user administration link").isEqualTo(admin);
  }

  @Test
  void theErrorPageOfAnExceptionHandlerKeepsTheMenu() throws Exception {
    String page = html(get("/boards/{id}", 987654321L).with(user("admin").roles("ADMIN")), 404);
    assertThat(page).contains(SIGN_OUT).contains(USERS_LINK);
  }

  @Test
  void theSignInPageShowsNoMenu() throws Exception {
    assertThat(html(get("/login"), 200)).doesNotContain(SIGN_OUT).doesNotContain(USERS_LINK);
  }

  private String html(MockHttpServletRequestBuilder request, int status) throws Exception {
    var response = mvc.perform(request).andReturn().getResponse();
    assertThat(response.getStatus()).isEqualTo(status);
    return response.getContentAsString();
  }
}
