package com.wayledger.hardening;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;

import com.wayledger.account.AccountService;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import tools.jackson.databind.JsonNode;

/**
 * Every request-body example in the published OpenAPI description is sent, as written, to its
 * endpoint (path variables set to a real site, board or circuit), and must succeed: an example a
 * client copies has to work.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class OpenApiExamplesIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AccountService accounts;

  @Test
  void everyExampleInTheDescriptionSucceeds() throws Exception {
    Fixture.ensureApiUser(accounts);
    Fixture fixture = new Fixture(mvc, jdbc);
    JsonNode description =
        Fixture.JSON.readTree(
            mvc.perform(get("/api/openapi")).andReturn().getResponse().getContentAsString());
    List<String> tried = new ArrayList<>();
    List<String> failed = new ArrayList<>();
    for (Map.Entry<String, JsonNode> path : description.get("paths").properties()) {
      for (Map.Entry<String, JsonNode> operation : path.getValue().properties()) {
        JsonNode content = operation.getValue().path("requestBody").path("content");
        for (Map.Entry<String, JsonNode> media : content.properties()) {
          for (Map.Entry<String, JsonNode> example :
              media.getValue().path("examples").properties()) {
            JsonNode value = example.getValue().get("value");
            String body =
                value.isString() ? value.asString() : Fixture.JSON.writeValueAsString(value);
            String url =
                path.getKey()
                    .replace("{siteId}", Long.toString(fixture.siteId))
                    .replace("{boardId}", Long.toString(fixture.boardId))
                    .replace("{id}", Long.toString(idFor(path.getKey(), fixture)));
            MvcResult result =
                mvc.perform(
                        MockMvcRequestBuilders.request(
                                HttpMethod.valueOf(operation.getKey().toUpperCase()), url)
                            .contentType(MediaType.APPLICATION_JSON)
                            .content(body)
                            .with(Fixture.api()))
                    .andReturn();
            String what = operation.getKey() + " " + path.getKey() + " '" + example.getKey() + "'";
            tried.add(what);
            int status = result.getResponse().getStatus();
            if (status < 200 || status >= 300) {
              failed.add(what + " → " + status + " " + result.getResponse().getContentAsString());
            }
          }
        }
      }
    }
    assertThat(tried).as("examples found in the description").isNotEmpty();
    assertThat(tried).anyMatch(t -> t.contains("/api/demand"));
    assertThat(failed).isEmpty();
  }

  private static long idFor(String path, Fixture fixture) {
    if (path.startsWith("/api/sites/")) {
      return fixture.siteId;
    }
    if (path.startsWith("/api/circuits/")) {
      return fixture.circuitId;
    }
    return fixture.boardId;
  }
}
