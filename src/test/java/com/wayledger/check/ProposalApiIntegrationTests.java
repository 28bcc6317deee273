package com.wayledger.check;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/** The device proposal over the API on the demo site: read it, fit it, and the lock. */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class ProposalApiIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  private long circuit(String description) {
    return jdbc.sql("SELECT id FROM circuit WHERE description = ?")
        .param(description)
        .query(Long.class)
        .list()
        .get(0);
  }

  private long version(long id) {
    return jdbc.sql("SELECT version FROM circuit WHERE id = ?")
        .param(id)
        .query(Long.class)
        .single();
  }

  @Test
  void proposalNamesTheDeviceTheChecksItPassesTheVersionAndTheCaution() throws Exception {
    long mixer = circuit("Spiral dough mixer");
    mvc.perform(get("/api/circuits/{id}/proposal", mixer).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.found").value(true))
        .andExpect(jsonPath("$.device.ratedCurrentAmps").isNumber())
        .andExpect(jsonPath("$.checks[0].verdict").value("PASS"))
        .andExpect(jsonPath("$.version").value(version(mixer)))
        .andExpect(jsonPath("$.caution", containsString("competent person")));
  }

  @Test
  void editorFitsTheProposalWithTheCurrentVersionAndAStaleOneIsRefused() throws Exception {
    long slicer = circuit("Spiral dough mixer");
    long v = version(slicer);
    mvc.perform(
            post("/api/circuits/{id}/proposal", slicer)
                .param("version", String.valueOf(v + 7))
                .with(editor()))
        .andExpect(status().isConflict());
    assertThat(version(slicer)).as("nothing changed on a stale version").isEqualTo(v);

    mvc.perform(
            post("/api/circuits/{id}/proposal", slicer)
                .param("version", String.valueOf(v))
                .with(editor()))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.found").value(true));
    assertThat(version(slicer)).as("the device was replaced").isGreaterThan(v);
  }

  @Test
  void viewerCannotFitAProposal() throws Exception {
    long mixer = circuit("Spiral dough mixer");
    mvc.perform(
            post("/api/circuits/{id}/proposal", mixer)
                .param("version", String.valueOf(version(mixer)))
                .with(viewer()))
        .andExpect(status().isForbidden());
  }

  @Test
  void circuitLocationIsReadAndChangedOverTheApiAndDecidesTheResidualCurrentFinding()
      throws Exception {
    long yard = circuit("Yard floodlights");
    mvc.perform(get("/api/circuits/{id}", yard).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.fields.location").value("OUTDOORS"));
    long board =
        jdbc.sql("SELECT board_id FROM circuit WHERE id = ?")
            .param(yard)
            .query(Long.class)
            .single();
    String path =
        "$.result.circuits[?(@.circuitId == " + yard + ")].findings[?(@.check == 'SOCKET_RCD')]";
    mvc.perform(get("/api/boards/{id}/findings", board).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(
            jsonPath(
                path + ".reference", org.hamcrest.Matchers.hasItem(containsString("411.3.3"))));

    String body =
        mvc.perform(get("/api/circuits/{id}", yard).with(viewer()))
            .andReturn()
            .getResponse()
            .getContentAsString();
    String fields =
        new tools.jackson.databind.ObjectMapper()
            .readTree(body)
            .get("fields")
            .toString()
            .replace("\"location\":\"OUTDOORS\"", "\"location\":null");
    mvc.perform(
            org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put(
                    "/api/circuits/{id}", yard)
                .contentType(org.springframework.http.MediaType.APPLICATION_JSON)
                .content(fields)
                .with(editor()))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.fields.location").doesNotExist());
    mvc.perform(get("/api/boards/{id}/findings", board).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(jsonPath(path + ".verdict", org.hamcrest.Matchers.hasItem("NOT_ASSESSED")))
        .andExpect(
            jsonPath(
                path + ".summary",
                org.hamcrest.Matchers.hasItem(containsString("location not recorded"))));
  }
}
