package com.wayledger.hardening;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import com.wayledger.account.AccountService;
import com.wayledger.account.Role;
import com.wayledger.account.UserForm;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.UUID;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.RequestPostProcessor;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A small site built through the app's own API and pages (so the fixture passes the same checks as
 * user input): a three-phase site, a three-phase board of 12 ways with one circuit and one load, an
 * upload waiting at its mapping step, and a user-defined copy of a diversity method.
 */
final class Fixture {

  static final String API_USER = "hardening-editor";
  static final String API_PASSWORD = "hardening-secret-741";
  static final JsonMapper JSON = JsonMapper.builder().build();

  final long siteId;
  final long boardId;
  final long circuitId;
  final long loadId;
  final String uploadToken;
  final String methodKey;

  static RequestPostProcessor api() {
    return httpBasic(API_USER, API_PASSWORD);
  }

  static RequestPostProcessor pageEditor() {
    return user(API_USER).roles("ADMIN");
  }

  static void ensureApiUser(AccountService accounts) {
    if (accounts.all().stream().noneMatch(u -> u.getUsername().equals(API_USER))) {
      accounts.create(new UserForm(API_USER, "Hardening editor", API_PASSWORD, Role.ADMIN));
    }
  }

  static Map<String, Object> siteJson(String name) {
    Map<String, Object> site = new LinkedHashMap<>();
    site.put("name", name);
    site.put("address", "1 Invented Row");
    site.put("earthingSystem", "TN_C_S");
    site.put("nominalVoltageVolts", 230);
    site.put("phases", 3);
    site.put("frequencyHertz", 50);
    site.put("externalLoopImpedanceOhms", 0.35);
    site.put("prospectiveFaultCurrentKiloAmps", 16);
    site.put("supplyFuseRatingAmps", 100);
    return site;
  }

  static Map<String, Object> boardJson(String reference, int phases) {
    Map<String, Object> board = new LinkedHashMap<>();
    board.put("reference", reference);
    board.put("location", "Store");
    board.put("phases", phases);
    board.put("wayCount", 12);
    board.put("busbarRatingAmps", 100);
    board.put("incomerKind", "MCCB");
    board.put("incomerRatingAmps", 63);
    board.put("incomerPoles", phases == 3 ? 3 : 2);
    board.put("incomerBreakingCapacityKiloAmps", 10);
    board.put("unbalanceLimitPercent", 10);
    board.put("coincidenceFactor", 1);
    return board;
  }

  static Map<String, Object> circuitJson(int way, String position, String description) {
    Map<String, Object> circuit = new LinkedHashMap<>();
    circuit.put("wayNumber", way);
    circuit.put("position", position);
    circuit.put("description", description);
    circuit.put("status", "IN_USE");
    circuit.put("deviceKind", "MCB");
    circuit.put("deviceCurve", "B");
    circuit.put("deviceRatingAmps", 16);
    circuit.put("devicePoles", 1);
    circuit.put("deviceBreakingCapacityKiloAmps", 6);
    circuit.put("loadDescription", "Kettle");
    circuit.put("loadCategory", "FIXED_APPLIANCE");
    circuit.put("loadQuantity", 1);
    circuit.put("loadRatingValue", 2000);
    circuit.put("loadRatingUnit", "W");
    circuit.put("loadPowerFactor", 1);
    return circuit;
  }

  static Map<String, Object> loadJson(String description) {
    Map<String, Object> load = new LinkedHashMap<>();
    load.put("description", description);
    load.put("category", "FIXED_APPLIANCE");
    load.put("quantity", 1);
    load.put("ratingValue", 500);
    load.put("ratingUnit", "W");
    load.put("powerFactor", 1);
    load.put("continuous", false);
    return load;
  }

  Fixture(MockMvc mvc, org.springframework.jdbc.core.simple.JdbcClient jdbc) throws Exception {
    String tag = UUID.randomUUID().toString().substring(0, 8);
    siteId = postJson(mvc, "/api/sites", siteJson("Hardening " + tag)).get("id").asLong();
    boardId =
        postJson(mvc, "/api/sites/" + siteId + "/boards", boardJson("HB-" + tag, 3))
            .get("id")
            .asLong();
    circuitId =
        postJson(mvc, "/api/boards/" + boardId + "/circuits", circuitJson(1, "L1", "Kettle way"))
            .asLong();
    loadId =
        jdbc.sql("SELECT MAX(id) FROM load_item WHERE circuit_id = ?")
            .param(circuitId)
            .query(Long.class)
            .single();
    String csv = "Cct,Phase,Description,Protection,Load kW\n2,L2,Lights,B6,0.5\n";
    MvcResult upload =
        mvc.perform(
                multipart("/boards/{id}/import", boardId)
                    .file(
                        new MockMultipartFile(
                            "file",
                            "foreign.csv",
                            "text/csv",
                            csv.getBytes(StandardCharsets.UTF_8)))
                    .with(pageEditor())
                    .with(csrf()))
            .andReturn();
    String location = upload.getResponse().getRedirectedUrl();
    uploadToken = location == null ? "none" : location.split("/")[4];
    methodKey = "copy-" + tag;
    mvc.perform(
            post("/methods/{key}/copy", "uk-small-shop")
                .param("newKey", methodKey)
                .param("newName", "Copy " + tag)
                .with(pageEditor())
                .with(csrf()))
        .andReturn();
  }

  static JsonNode postJson(MockMvc mvc, String url, Object body) throws Exception {
    MvcResult result =
        mvc.perform(
                post(url)
                    .contentType(MediaType.APPLICATION_JSON)
                    .content(JSON.writeValueAsString(body))
                    .with(api()))
            .andReturn();
    int status = result.getResponse().getStatus();
    if (status >= 300) {
      throw new IllegalStateException(
          "fixture "
              + url
              + " answered "
              + status
              + ": "
              + result.getResponse().getContentAsString());
    }
    return JSON.readTree(result.getResponse().getContentAsString());
  }
}
