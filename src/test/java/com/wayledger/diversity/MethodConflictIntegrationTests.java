package com.wayledger.diversity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.demand.DiversityMethods;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Saving a diversity method from a version someone else has since saved: 409 with the form keeping
 * what was typed, never a 500 or an overwrite; an unknown key is 404, a built-in method 422.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class MethodConflictIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired MethodLibrary library;

  @Test
  void aSaveFromAStaleVersionIsAConflictThatKeepsTheTypedName() throws Exception {
    String key = "shop-" + UUID.randomUUID().toString().substring(0, 8);
    library.copy(DiversityMethods.UK_SMALL_SHOP, key, "Shop copy", "ada");
    long opened = library.entry(key).version();

    mvc.perform(save(key, opened, "Saved first")).andExpect(status().is3xxRedirection());
    String page =
        mvc.perform(save(key, opened, "Typed second"))
            .andExpect(status().isConflict())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(page).contains("Someone else saved this method").contains("Typed second");
    assertThat(library.entry(key).method().name()).as("first save kept").isEqualTo("Saved first");
  }

  @Test
  void anUnknownMethodIsNotFound() throws Exception {
    mvc.perform(save("no-such-method", 0, "x")).andExpect(status().isNotFound());
  }

  @Test
  void aBuiltInMethodIsRefusedWithAMessage() throws Exception {
    mvc.perform(save(DiversityMethods.UK_SMALL_SHOP, 0, "x"))
        .andExpect(status().isUnprocessableContent());
  }

  private static org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder save(
      String key, long version, String name) {
    return post("/methods/{key}", key)
        .with(user("eddie").roles("EDITOR"))
        .with(csrf())
        .param("version", Long.toString(version))
        .param("name", name);
  }
}
