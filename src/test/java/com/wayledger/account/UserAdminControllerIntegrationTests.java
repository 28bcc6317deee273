package com.wayledger.account;

import static com.wayledger.support.Roles.admin;
import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasSize;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.BDDMockito.given;
import static org.mockito.BDDMockito.willThrow;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import com.wayledger.system.RuleViolation;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.webmvc.test.autoconfigure.WebMvcTest;
import org.springframework.context.annotation.Import;
import org.springframework.test.context.bean.override.mockito.MockitoBean;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/** The sign-in page and the user administration page: only admins manage users. */
@WebMvcTest(UserAdminController.class)
@Import(SecurityConfig.class)
class UserAdminControllerIntegrationTests {

  @Autowired MockMvc mvc;
  @MockitoBean AccountService accounts;

  private static MockHttpServletRequestBuilder postUser(String username, String password) {
    return postUser(username, password, "EDITOR");
  }

  private static MockHttpServletRequestBuilder postUser(
      String username, String password, String role) {
    return post("/admin/users")
        .param("username", username)
        .param("displayName", "Nia Okafor")
        .param("password", password)
        .param("role", role);
  }

  @Test
  void signInPageIsOpenToEveryone() throws Exception {
    mvc.perform(get("/login"))
        .andExpect(status().isOk())
        .andExpect(view().name("account/login"))
        .andExpect(content().string(containsString("name=\"_csrf\"")));
  }

  @Test
  void adminSeesTheUsers() throws Exception {
    given(accounts.all())
        .willReturn(List.of(new AppUser("nia", "{noop}x", "Nia Okafor", Role.EDITOR)));

    mvc.perform(get("/admin/users").with(admin()))
        .andExpect(status().isOk())
        .andExpect(view().name("account/users"))
        .andExpect(model().attribute("users", hasSize(1)))
        .andExpect(content().string(containsString("Nia Okafor")));
  }

  @Test
  void editorAndViewerCannotSeeTheUsers() throws Exception {
    mvc.perform(get("/admin/users").with(editor())).andExpect(status().isForbidden());
    mvc.perform(get("/admin/users").with(viewer())).andExpect(status().isForbidden());
  }

  @Test
  void anonymousVisitorIsSentToSignIn() throws Exception {
    mvc.perform(get("/admin/users"))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/login"));
  }

  @Test
  void adminAddsAUser() throws Exception {
    mvc.perform(postUser("nia", "long-enough-secret").with(admin()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/admin/users"));
    verify(accounts).create(new UserForm("nia", "Nia Okafor", "long-enough-secret", Role.EDITOR));
  }

  @Test
  void shortPasswordComesBackWith422BesideTheField() throws Exception {
    mvc.perform(postUser("nia", "short").with(admin()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name("account/users"))
        .andExpect(model().attributeHasFieldErrorCode("form", "password", "Size"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"password-error\">Must be between 10 and 200 characters.</p>")));
    verify(accounts, never()).create(any());
  }

  @Test
  void userNameWithSpacesIsRefused() throws Exception {
    mvc.perform(postUser("nia okafor", "long-enough-secret").with(admin()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "username", "Pattern"))
        .andExpect(content().string(containsString("Letters, digits and . _ @ - only.")));
    verify(accounts, never()).create(any());
  }

  @Test
  void unknownRoleIsRefused() throws Exception {
    mvc.perform(postUser("nia", "long-enough-secret", "OWNER").with(admin()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "role", "typeMismatch"));
    verify(accounts, never()).create(any());
  }

  @Test
  void takenUserNameShowsBesideTheField() throws Exception {
    given(accounts.create(any())).willThrow(new RuleViolation("username", "user.username.taken"));

    mvc.perform(postUser("nia", "long-enough-secret").with(admin()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "username", "user.username.taken"))
        .andExpect(content().string(containsString("That user name is taken.")));
  }

  @Test
  void postWithoutCsrfTokenIsRefused() throws Exception {
    mvc.perform(postUser("nia", "long-enough-secret").with(admin()))
        .andExpect(status().isForbidden());
    verify(accounts, never()).create(any());
  }

  @Test
  void editorCannotAddUsersOrChangeRoles() throws Exception {
    mvc.perform(postUser("nia", "long-enough-secret").with(editor()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(post("/admin/users/1/role").param("role", "ADMIN").with(editor()).with(csrf()))
        .andExpect(status().isForbidden());
    verify(accounts, never()).create(any());
    verify(accounts, never()).changeRole(anyLong(), any());
  }

  @Test
  void lastAdminKeepsTheRoleWithTheReason() throws Exception {
    willThrow(new RuleViolation("role", "user.role.lastAdmin"))
        .given(accounts)
        .changeRole(1, Role.VIEWER);

    mvc.perform(post("/admin/users/1/role").param("role", "VIEWER").with(admin()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/admin/users"))
        .andExpect(flash().attribute("problem", "user.role.lastAdmin"));
  }
}
