package com.wayledger.site;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasSize;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.ArgumentMatchers.eq;
import static org.mockito.BDDMockito.given;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import com.wayledger.account.SecurityConfig;
import com.wayledger.diversity.MethodLibrary;
import com.wayledger.diversity.StoredMethodRepository;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.webmvc.test.autoconfigure.WebMvcTest;
import org.springframework.context.annotation.Import;
import org.springframework.test.context.bean.override.mockito.MockitoBean;
import org.springframework.test.util.ReflectionTestUtils;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/** The site pages: who may see and change them, and how bad input comes back. */
@WebMvcTest(SiteController.class)
@Import({SecurityConfig.class, MethodLibrary.class})
class SiteControllerIntegrationTests {

  @Autowired MockMvc mvc;
  @MockitoBean SiteService sites;
  @MockitoBean StoredMethodRepository storedMethods;
  @MockitoBean com.wayledger.system.RowLocks rowLocks;

  static Site storedSite(long id, String name) {
    Site site = new Site(name);
    site.apply(
        new SiteForm(
            name,
            "1 Test Row",
            EarthingSystem.TN_S,
            230.0,
            3,
            50.0,
            0.35,
            16.0,
            100.0,
            null,
            null,
            4L));
    ReflectionTestUtils.setField(site, "id", id);
    return site;
  }

  /**
   * A complete, acceptable site form as the browser posts it, with some fields replaced: pairs of
   * name and value, so that each field is sent once.
   */
  static MockHttpServletRequestBuilder postSite(String url, String... replaced) {
    Map<String, String> fields = new LinkedHashMap<>();
    fields.put("name", "Quarry Road Depot");
    fields.put("address", "");
    fields.put("earthingSystem", "TN_C_S");
    fields.put("nominalVoltageVolts", "230");
    fields.put("phases", "3");
    fields.put("frequencyHertz", "50");
    fields.put("externalLoopImpedanceOhms", "0.35");
    fields.put("prospectiveFaultCurrentKiloAmps", "");
    fields.put("supplyFuseRatingAmps", "100");
    fields.put("notes", "");
    for (int i = 0; i < replaced.length; i += 2) {
      fields.put(replaced[i], replaced[i + 1]);
    }
    MockHttpServletRequestBuilder request = post(url);
    fields.forEach(request::param);
    return request;
  }

  @Test
  void viewerSeesTheSiteList() throws Exception {
    given(sites.page("", 0))
        .willReturn(
            new org.springframework.data.domain.PageImpl<>(List.of(storedSite(1, "Harbour Mill"))));

    mvc.perform(get("/sites").with(viewer()))
        .andExpect(status().isOk())
        .andExpect(view().name("site/list"))
        .andExpect(model().attribute("sites", hasSize(1)))
        .andExpect(content().string(containsString("Harbour Mill")));
  }

  @Test
  void anonymousVisitorIsSentToSignIn() throws Exception {
    mvc.perform(get("/sites"))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/login"));
  }

  @Test
  void editorOpensTheNewSiteForm() throws Exception {
    mvc.perform(get("/sites/new").with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name("site/form"))
        .andExpect(model().attributeExists("form", "earthingSystems"));
  }

  @Test
  void viewerCannotOpenTheNewSiteForm() throws Exception {
    mvc.perform(get("/sites/new").with(viewer())).andExpect(status().isForbidden());
  }

  @Test
  void viewerCannotOpenTheEditForm() throws Exception {
    given(sites.get(7)).willReturn(storedSite(7, "Harbour Mill"));

    mvc.perform(get("/sites/7/edit").with(viewer())).andExpect(status().isForbidden());
  }

  @Test
  void editorOpensTheEditFormFilledFromTheSite() throws Exception {
    given(sites.get(7)).willReturn(storedSite(7, "Harbour Mill"));

    mvc.perform(get("/sites/7/edit").with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name("site/form"))
        .andExpect(model().attribute("form", SiteForm.of(storedSite(7, "Harbour Mill"))));
  }

  @Test
  void editFormOfAnUnknownSiteIsNotFound() throws Exception {
    given(sites.get(404)).willThrow(new NotFoundException("Site", 404));

    mvc.perform(get("/sites/404/edit").with(editor()))
        .andExpect(status().isNotFound())
        .andExpect(view().name("error/problem"));
  }

  @Test
  void savedSiteRedirectsToItsPage() throws Exception {
    given(sites.create(any())).willReturn(storedSite(12, "Quarry Road Depot"));

    mvc.perform(postSite("/sites").with(editor()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/sites/12"));
    verify(sites)
        .create(
            new SiteForm(
                "Quarry Road Depot",
                "",
                EarthingSystem.TN_C_S,
                230.0,
                3,
                50.0,
                0.35,
                null,
                100.0,
                null,
                "",
                null));
  }

  @Test
  void blankNameComesBackWith422AndTheMessageBesideTheField() throws Exception {
    mvc.perform(postSite("/sites", "name", " ").with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name("site/form"))
        .andExpect(model().attributeHasFieldErrorCode("form", "name", "NotBlank"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"name-error\">Please fill this in.</p>")));
    verify(sites, never()).create(any());
  }

  @Test
  void lettersInAVoltageFieldKeepTheOtherValuesTyped() throws Exception {
    mvc.perform(postSite("/sites", "nominalVoltageVolts", "two-thirty").with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(
            model().attributeHasFieldErrorCode("form", "nominalVoltageVolts", "typeMismatch"))
        .andExpect(content().string(containsString("value=\"Quarry Road Depot\"")))
        .andExpect(content().string(containsString("Please enter a number, such as 2.5.")));
    verify(sites, never()).create(any());
  }

  @Test
  void voltageAboveTheLimitIsRefused() throws Exception {
    mvc.perform(postSite("/sites", "nominalVoltageVolts", "1200").with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "nominalVoltageVolts", "DecimalMax"))
        .andExpect(content().string(containsString("Must be at most 1000.")));
  }

  @Test
  void ruleBrokenInTheServiceShowsBesideItsField() throws Exception {
    given(sites.create(any())).willThrow(new RuleViolation("name", "site.name.taken"));

    mvc.perform(postSite("/sites").with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "name", "site.name.taken"))
        .andExpect(content().string(containsString("Another site already has this name.")));
  }

  @Test
  void postWithoutCsrfTokenIsRefused() throws Exception {
    mvc.perform(postSite("/sites").with(editor())).andExpect(status().isForbidden());
    verify(sites, never()).create(any());
  }

  @Test
  void viewerCannotCreateASite() throws Exception {
    mvc.perform(postSite("/sites").with(viewer()).with(csrf())).andExpect(status().isForbidden());
    verify(sites, never()).create(any());
  }

  @Test
  void viewerCannotChangeASite() throws Exception {
    mvc.perform(postSite("/sites/7").with(viewer()).with(csrf())).andExpect(status().isForbidden());
    verify(sites, never()).update(anyLong(), any());
  }

  @Test
  void editorUpdatesASite() throws Exception {
    given(sites.get(7)).willReturn(storedSite(7, "Harbour Mill"));

    mvc.perform(postSite("/sites/7", "version", "4").with(editor()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/sites/7"));
    verify(sites).update(eq(7L), any());
  }
}
