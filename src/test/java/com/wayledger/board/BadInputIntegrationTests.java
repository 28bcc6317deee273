package com.wayledger.board;

import static com.wayledger.support.Roles.editor;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.hasItem;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.account.AccountService;
import com.wayledger.account.Role;
import com.wayledger.account.UserForm;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.RequestPostProcessor;
import tools.jackson.databind.json.JsonMapper;

/**
 * Bad input through the whole application, on the pages and on the JSON API: every request gets a
 * 4xx (on the pages, 422 with the message inside the field's own box), never a 500, and the
 * database holds exactly what it held before.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class BadInputIntegrationTests {

  private static final String API_USER = "bad-input-editor";
  private static final String API_PASSWORD = "bad-input-secret-7";
  private static final String TOO_LONG = "x".repeat(121);
  private static final List<String> TABLES =
      List.of("site", "board", "circuit", "load_item", "way_slot");

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AccountService accounts;

  private final JsonMapper json = JsonMapper.builder().build();

  /**
   * A three-phase board of 6 ways with a circuit at way 1 L1, and a single-phase board of 4 ways.
   */
  private long threePhaseBoardId;

  private long singlePhaseBoardId;
  private long existingCircuitId;
  private long siteId;

  @BeforeEach
  void fixture() {
    if (!accounts.all().stream().anyMatch(user -> user.getUsername().equals(API_USER))) {
      accounts.create(new UserForm(API_USER, "Bad input editor", API_PASSWORD, Role.EDITOR));
    }
    siteId =
        sites
            .create(
                new SiteForm(
                    "Bad input " + UUID.randomUUID(),
                    null,
                    EarthingSystem.TN_C_S,
                    230.0,
                    3,
                    50.0,
                    0.35,
                    16.0,
                    100.0,
                    null,
                    null,
                    null))
            .getId();
    threePhaseBoardId = boards.create(siteId, boardForm("DB-3", 3, 6)).getId();
    singlePhaseBoardId = boards.create(siteId, boardForm("DB-1", 1, 4)).getId();
    existingCircuitId =
        schedule
            .addCircuit(
                threePhaseBoardId,
                new CircuitForm(
                    1,
                    PhasePosition.L1,
                    "Existing lighting",
                    WayStatus.IN_USE,
                    false,
                    DeviceKind.MCB,
                    TripCurve.B,
                    6.0,
                    1,
                    6.0,
                    null,
                    null,
                    1.5,
                    1.0,
                    null,
                    null,
                    12.0,
                    null,
                    null,
                    null,
                    null,
                    null,
                    "Ceiling lights",
                    LoadCategory.LIGHTING,
                    6,
                    40.0,
                    RatingUnit.W,
                    0.9,
                    null))
            .getId();
  }

  private static BoardForm boardForm(String reference, int phases, int ways) {
    return new BoardForm(
        reference,
        "Test room",
        phases,
        ways,
        100.0,
        DeviceKind.MCCB,
        null,
        63.0,
        phases == 3 ? 3 : 2,
        10.0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0,
        1.0,
        null,
        null,
        null,
        null);
  }

  // ---------------------------------------------------------------- pages

  /**
   * Bad new circuits for the inline editor: board, replaced fields, field at fault, message shown.
   */
  static Stream<Arguments> badNewCircuits() {
    return Stream.of(
        page(
            "letters for the device rating",
            "three",
            "deviceRatingAmps",
            "abc",
            "deviceRatingAmps",
            "Please enter a number, such as 2.5."),
        page(
            "letters for the load rating",
            "three",
            "loadRatingValue",
            "abc",
            "loadRatingValue",
            "Please enter a number, such as 2.5."),
        page(
            "negative load rating",
            "three",
            "loadRatingValue",
            "-3000",
            "loadRatingValue",
            "Must be greater than zero."),
        page(
            "zero device rating",
            "three",
            "deviceRatingAmps",
            "0",
            "deviceRatingAmps",
            "Must be greater than zero."),
        page(
            "negative device rating",
            "three",
            "deviceRatingAmps",
            "-16",
            "deviceRatingAmps",
            "Must be greater than zero."),
        page(
            "power factor zero",
            "three",
            "loadPowerFactor",
            "0",
            "loadPowerFactor",
            "Power factor must be above 0 and at most 1."),
        page(
            "power factor 1.5",
            "three",
            "loadPowerFactor",
            "1.5",
            "loadPowerFactor",
            "Power factor must be above 0 and at most 1."),
        page(
            "description of 121 characters",
            "three",
            "description",
            TOO_LONG,
            "description",
            "Must be between 0 and 120 characters."),
        page(
            "load description of 121 characters",
            "three",
            "loadDescription",
            TOO_LONG,
            "loadDescription",
            "Must be between 0 and 120 characters."),
        page(
            "letters for the way number",
            "three",
            "wayNumber",
            "four",
            "wayNumber",
            "Please enter a whole number."),
        page(
            "way beyond the board",
            "three",
            "wayNumber",
            "7",
            "wayNumber",
            "This board has 6 ways."),
        page(
            "occupied position",
            "three",
            "wayNumber",
            "1",
            "position",
            "L1",
            "wayNumber",
            "Way 1 L1 already holds a circuit."),
        page(
            "three-pole over an occupied line",
            "three",
            "wayNumber",
            "1",
            "position",
            "THREE_POLE",
            "wayNumber",
            "Way 1 L1 already holds a circuit."),
        page(
            "three-pole on a single-phase board",
            "single",
            "position",
            "THREE_POLE",
            "position",
            "A single-phase board has only line L1."),
        page(
            "line L2 on a single-phase board",
            "single",
            "position",
            "L2",
            "position",
            "A single-phase board has only line L1."),
        page("unknown line", "three", "position", "L4", "position", "Not a valid value here."),
        page(
            "first load on an empty position",
            "three",
            "status",
            "EMPTY",
            "deviceKind",
            "",
            "loadDescription",
            "Loads can only be added to a circuit in use."),
        page(
            "MCCB Ir above In",
            "three",
            "deviceKind",
            "MCCB",
            "deviceRatingAmps",
            "100",
            "deviceOverloadSettingAmps",
            "125",
            "deviceInstantaneousSettingAmps",
            "1000",
            "deviceOverloadSettingAmps",
            "The overload setting Ir cannot be above the rating In (100 A)."),
        page(
            "MCCB Ii without Ir",
            "three",
            "deviceKind",
            "MCCB",
            "deviceRatingAmps",
            "100",
            "deviceInstantaneousSettingAmps",
            "500",
            "deviceOverloadSettingAmps",
            "Record both MCCB settings, Ir and Ii, or neither (the checks then assume Ir = In and Ii = 10·In)."),
        page(
            "MCCB Ii above 63 kA",
            "three",
            "deviceKind",
            "MCCB",
            "deviceRatingAmps",
            "100",
            "deviceOverloadSettingAmps",
            "100",
            "deviceInstantaneousSettingAmps",
            "70000",
            "deviceInstantaneousSettingAmps",
            "Must be at most 63000."));
  }

  private static Arguments page(String name, String board, String... replacedThenFieldAndMessage) {
    int n = replacedThenFieldAndMessage.length;
    String[] replaced = java.util.Arrays.copyOf(replacedThenFieldAndMessage, n - 2);
    return Arguments.of(
        name,
        board,
        replaced,
        replacedThenFieldAndMessage[n - 2],
        replacedThenFieldAndMessage[n - 1]);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("badNewCircuits")
  void badNewCircuitOnThePageIsRefusedBesideItsField(
      String name, String board, String[] replaced, String field, String message) throws Exception {
    long boardId = board.equals("single") ? singlePhaseBoardId : threePhaseBoardId;
    Snapshot before = snapshot();

    MvcResult result =
        mvc.perform(
                form(post("/boards/{id}/circuits", boardId), circuitFields(), replaced)
                    .header("HX-Request", "true")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();

    assertMessageBesideField(result.getResponse().getContentAsString(), field, message);
    assertThat(snapshot()).as("database after: " + name).isEqualTo(before);
  }

  @Test
  void withoutHtmxTheWholePageComesBackWithTheMessage() throws Exception {
    Snapshot before = snapshot();

    MvcResult result =
        mvc.perform(
                form(
                        post("/boards/{id}/circuits", threePhaseBoardId),
                        circuitFields(),
                        "wayNumber",
                        "7")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();

    String html = result.getResponse().getContentAsString();
    assertMessageBesideField(html, "wayNumber", "This board has 6 ways.");
    assertThat(html).as("whole page with the caution").contains("<footer class=\"caution\"");
    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void badChangeToAStoredCircuitLeavesItAsItWas() throws Exception {
    Snapshot before = snapshot();
    long version = schedule.circuit(existingCircuitId).getVersion();

    MvcResult letters =
        mvc.perform(
                form(
                        post("/circuits/{id}", existingCircuitId),
                        existingCircuitFields(version),
                        "deviceRatingAmps",
                        "six")
                    .header("HX-Request", "true")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();
    MvcResult beyond =
        mvc.perform(
                form(
                        post("/circuits/{id}", existingCircuitId),
                        existingCircuitFields(version),
                        "wayNumber",
                        "99")
                    .header("HX-Request", "true")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();

    assertMessageBesideField(
        letters.getResponse().getContentAsString(),
        "deviceRatingAmps",
        "Please enter a number, such as 2.5.");
    assertMessageBesideField(
        beyond.getResponse().getContentAsString(), "wayNumber", "Must be at most 96.");
    assertThat(snapshot()).isEqualTo(before);
  }

  static Stream<Arguments> badLoads() {
    return Stream.of(
        Arguments.of("powerFactor", "0", "Power factor must be above 0 and at most 1."),
        Arguments.of("powerFactor", "1.5", "Power factor must be above 0 and at most 1."),
        Arguments.of("ratingValue", "-1", "Must be greater than zero."),
        Arguments.of("ratingValue", "0", "Must be greater than zero."),
        Arguments.of("ratingValue", "abc", "Please enter a number, such as 2.5."),
        Arguments.of("quantity", "1.5", "Please enter a whole number."),
        Arguments.of("description", TOO_LONG, "Must be between 0 and 120 characters."));
  }

  @ParameterizedTest(name = "load {0} = {1}")
  @MethodSource("badLoads")
  void badLoadOnThePageIsRefusedBesideItsField(String field, String value, String message)
      throws Exception {
    Snapshot before = snapshot();

    MvcResult result =
        mvc.perform(
                form(post("/circuits/{id}/loads", existingCircuitId), loadFields(), field, value)
                    .header("HX-Request", "true")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();

    assertMessageBesideField(result.getResponse().getContentAsString(), field, message);
    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void badSiteAndBoardFormsAreRefusedBesideTheirFields() throws Exception {
    Snapshot before = snapshot();

    MvcResult longName =
        mvc.perform(
                form(post("/sites"), siteFields(), "name", TOO_LONG).with(editor()).with(csrf()))
            .andExpect(status().is(422))
            .andReturn();
    MvcResult zeroWays =
        mvc.perform(
                form(post("/sites/{id}/boards", siteId), boardFields(), "wayCount", "0")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();
    MvcResult shrunk =
        mvc.perform(
                form(
                        post("/boards/{id}", threePhaseBoardId),
                        boardFields(),
                        "reference",
                        "DB-3",
                        "wayCount",
                        "0")
                    .with(editor())
                    .with(csrf()))
            .andExpect(status().is(422))
            .andReturn();

    assertMessageBesideField(
        longName.getResponse().getContentAsString(),
        "name",
        "Must be between 0 and 120 characters.");
    assertMessageBesideField(
        zeroWays.getResponse().getContentAsString(), "wayCount", "Must be at least 1.");
    assertMessageBesideField(
        shrunk.getResponse().getContentAsString(), "wayCount", "Must be at least 1.");
    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void unknownIdsOnThePagesAreNotFound() throws Exception {
    Snapshot before = snapshot();

    mvc.perform(get("/boards/999999").with(editor())).andExpect(status().isNotFound());
    mvc.perform(get("/sites/999999").with(editor())).andExpect(status().isNotFound());
    mvc.perform(get("/circuits/999999/edit").with(editor())).andExpect(status().isNotFound());
    mvc.perform(form(post("/circuits/999999"), circuitFields()).with(editor()).with(csrf()))
        .andExpect(status().isNotFound());
    mvc.perform(form(post("/boards/999999/circuits"), circuitFields()).with(editor()).with(csrf()))
        .andExpect(status().isNotFound());
    mvc.perform(form(post("/circuits/999999/loads"), loadFields()).with(editor()).with(csrf()))
        .andExpect(status().isNotFound());
    mvc.perform(post("/circuits/999999/delete").with(editor()).with(csrf()))
        .andExpect(status().isNotFound());
    mvc.perform(form(post("/sites/999999/boards"), boardFields()).with(editor()).with(csrf()))
        .andExpect(status().isNotFound());

    assertThat(snapshot()).isEqualTo(before);
  }

  // ---------------------------------------------------------------- JSON API

  static Stream<Arguments> badApiCircuits() {
    return Stream.of(
        api(
            "letters for the device rating",
            "three",
            400,
            "deviceRatingAmps",
            "deviceRatingAmps",
            "abc"),
        api("negative load rating", "three", 400, "loadRatingValue", "loadRatingValue", -3000),
        api("zero device rating", "three", 400, "deviceRatingAmps", "deviceRatingAmps", 0),
        api("power factor zero", "three", 400, "loadPowerFactor", "loadPowerFactor", 0),
        api("power factor 1.5", "three", 400, "loadPowerFactor", "loadPowerFactor", 1.5),
        api("description of 121 characters", "three", 400, "description", "description", TOO_LONG),
        api("unknown line", "three", 400, "position", "position", "L4"),
        api("way beyond the board", "three", 422, "wayNumber", "wayNumber", 7),
        api("occupied position", "three", 422, "wayNumber", "wayNumber", 1, "position", "L1"),
        api(
            "three-pole on a single-phase board",
            "single",
            422,
            "position",
            "position",
            "THREE_POLE"),
        api(
            "MCCB Ir above In",
            "three",
            422,
            "deviceOverloadSettingAmps",
            "deviceKind",
            "MCCB",
            "deviceRatingAmps",
            100,
            "deviceOverloadSettingAmps",
            125,
            "deviceInstantaneousSettingAmps",
            1000),
        api(
            "MCCB Ir of zero",
            "three",
            400,
            "deviceOverloadSettingAmps",
            "deviceKind",
            "MCCB",
            "deviceRatingAmps",
            100,
            "deviceOverloadSettingAmps",
            0,
            "deviceInstantaneousSettingAmps",
            1000));
  }

  private static Arguments api(
      String name, String board, int status, String field, Object... replaced) {
    return Arguments.of(name, board, status, field, replaced);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("badApiCircuits")
  void badNewCircuitOnTheApiIsRefusedNamingItsField(
      String name, String board, int expectedStatus, String field, Object[] replaced)
      throws Exception {
    long boardId = board.equals("single") ? singlePhaseBoardId : threePhaseBoardId;
    Map<String, Object> body = circuitJson();
    for (int i = 0; i < replaced.length; i += 2) {
      body.put((String) replaced[i], replaced[i + 1]);
    }
    Snapshot before = snapshot();

    mvc.perform(apiPost("/api/boards/" + boardId + "/circuits", body))
        .andExpect(status().is(expectedStatus))
        .andExpect(jsonPath("$.fields[*].field", hasItem(field)));

    assertThat(snapshot()).as("database after: " + name).isEqualTo(before);
  }

  @Test
  void badLoadsOnTheApiAreRefusedNamingTheField() throws Exception {
    Snapshot before = snapshot();

    for (Object powerFactor : List.of(0, 1.5, -0.5)) {
      Map<String, Object> body = loadJson();
      body.put("powerFactor", powerFactor);
      mvc.perform(apiPost("/api/circuits/" + existingCircuitId + "/loads", body))
          .andExpect(status().isBadRequest())
          .andExpect(jsonPath("$.fields[*].field", hasItem("powerFactor")));
    }
    Map<String, Object> negative = loadJson();
    negative.put("ratingValue", -2000);
    mvc.perform(apiPost("/api/circuits/" + existingCircuitId + "/loads", negative))
        .andExpect(status().isBadRequest())
        .andExpect(jsonPath("$.fields[*].field", hasItem("ratingValue")));

    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void unknownIdsOnTheApiAreNotFound() throws Exception {
    Snapshot before = snapshot();

    mvc.perform(get("/api/boards/999999").with(apiUser())).andExpect(status().isNotFound());
    mvc.perform(get("/api/sites/999999").with(apiUser())).andExpect(status().isNotFound());
    mvc.perform(apiPost("/api/boards/999999/circuits", circuitJson()))
        .andExpect(status().isNotFound());
    mvc.perform(apiPost("/api/circuits/999999/loads", loadJson())).andExpect(status().isNotFound());
    mvc.perform(delete("/api/circuits/999999").with(apiUser())).andExpect(status().isNotFound());

    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void malformedJsonIsABadRequest() throws Exception {
    Snapshot before = snapshot();

    mvc.perform(
            post("/api/boards/" + threePhaseBoardId + "/circuits")
                .with(apiUser())
                .contentType(MediaType.APPLICATION_JSON)
                .content("{\"wayNumber\": 4, \"position\": "))
        .andExpect(status().isBadRequest());

    assertThat(snapshot()).isEqualTo(before);
  }

  @Test
  void acceptableCircuitOnTheApiIsStoredSoTheRefusalsAboveAreNotVacuous() throws Exception {
    Snapshot before = snapshot();

    mvc.perform(apiPost("/api/boards/" + threePhaseBoardId + "/circuits", circuitJson()))
        .andExpect(status().isCreated());

    Snapshot after = snapshot();
    assertThat(after.counts().get("circuit")).isEqualTo(before.counts().get("circuit") + 1);
    assertThat(after.counts().get("load_item")).isEqualTo(before.counts().get("load_item") + 1);
    assertThat(after.counts().get("way_slot")).isEqualTo(before.counts().get("way_slot") + 1);
  }

  @Test
  void acceptableCircuitOnThePageIsStoredSoTheRefusalsAboveAreNotVacuous() throws Exception {
    Snapshot before = snapshot();

    mvc.perform(
            form(post("/boards/{id}/circuits", threePhaseBoardId), circuitFields())
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().isOk());

    assertThat(snapshot().counts().get("circuit")).isEqualTo(before.counts().get("circuit") + 1);
  }

  // ---------------------------------------------------------------- helpers

  /** Row counts of every schedule table, and the stored circuits of the fixture's boards. */
  record Snapshot(Map<String, Long> counts, List<Map<String, Object>> circuits) {}

  private Snapshot snapshot() {
    Map<String, Long> counts = new LinkedHashMap<>();
    for (String table : TABLES) {
      counts.put(table, jdbc.sql("SELECT COUNT(*) FROM " + table).query(Long.class).single());
    }
    List<Map<String, Object>> circuits =
        jdbc.sql(
                "SELECT id, way_number, position, description, device_rating_amps, version FROM circuit"
                    + " WHERE board_id IN (?, ?) ORDER BY id")
            .params(threePhaseBoardId, singlePhaseBoardId)
            .query()
            .listOfRows();
    return new Snapshot(counts, circuits);
  }

  /**
   * The message must sit inside the same field box as the input or select of that name (the
   * form-field fragments render the error there), not only somewhere on the page.
   */
  private static void assertMessageBesideField(String html, String field, String message) {
    Pattern box =
        Pattern.compile(
            "<div class=\"field[^\"]*has-error\">(?:(?!</div>).)*?name=\""
                + Pattern.quote(field)
                + "\"(?:(?!</div>).)*?<p class=\"error\"[^>]*>"
                + Pattern.quote(message)
                + "</p>",
            Pattern.DOTALL);
    assertThat(box.matcher(html).find())
        .as("field %s shows \"%s\" in its own box; page was:%n%s", field, message, html)
        .isTrue();
  }

  private static MockHttpServletRequestBuilder form(
      MockHttpServletRequestBuilder request, Map<String, String> base, String... replaced) {
    Map<String, String> fields = new LinkedHashMap<>(base);
    for (int i = 0; i < replaced.length; i += 2) {
      fields.put(replaced[i], replaced[i + 1]);
    }
    fields.forEach(request::param);
    return request;
  }

  private MockHttpServletRequestBuilder apiPost(String url, Map<String, Object> body) {
    return post(url)
        .with(apiUser())
        .contentType(MediaType.APPLICATION_JSON)
        .content(json.writeValueAsString(body));
  }

  private static RequestPostProcessor apiUser() {
    return httpBasic(API_USER, API_PASSWORD);
  }

  /** A valid new circuit at way 4 L2 with a first load, as the inline editor posts it. */
  private static Map<String, String> circuitFields() {
    return PageFixtures.circuitFields();
  }

  private Map<String, String> existingCircuitFields(long version) {
    Map<String, String> fields = new LinkedHashMap<>(PageFixtures.circuitFields());
    fields.put("wayNumber", "1");
    fields.put("position", "L1");
    fields.put("description", "Existing lighting, renamed");
    fields.put("loadDescription", "");
    fields.put("loadRatingValue", "");
    fields.put("version", Long.toString(version));
    return fields;
  }

  private static Map<String, String> loadFields() {
    return PageFixtures.loadFields();
  }

  private static Map<String, String> siteFields() {
    Map<String, String> fields = new LinkedHashMap<>();
    fields.put("name", "Bad input site form");
    fields.put("earthingSystem", "TN_S");
    fields.put("nominalVoltageVolts", "230");
    fields.put("phases", "3");
    fields.put("frequencyHertz", "50");
    return fields;
  }

  private static Map<String, String> boardFields() {
    return PageFixtures.boardFields();
  }

  private static Map<String, Object> circuitJson() {
    Map<String, Object> body = new LinkedHashMap<>();
    body.put("wayNumber", 4);
    body.put("position", "L2");
    body.put("description", "Kettle point");
    body.put("status", "IN_USE");
    body.put("deviceKind", "MCB");
    body.put("deviceCurve", "B");
    body.put("deviceRatingAmps", 16);
    body.put("deviceBreakingCapacityKiloAmps", 6);
    body.put("loadDescription", "Kettle");
    body.put("loadCategory", "FIXED_APPLIANCE");
    body.put("loadQuantity", 1);
    body.put("loadRatingValue", 3000);
    body.put("loadRatingUnit", "W");
    body.put("loadPowerFactor", 1);
    return body;
  }

  private static Map<String, Object> loadJson() {
    Map<String, Object> body = new LinkedHashMap<>();
    body.put("description", "Toaster");
    body.put("category", "FIXED_APPLIANCE");
    body.put("quantity", 1);
    body.put("ratingValue", 2200);
    body.put("ratingUnit", "W");
    body.put("powerFactor", 1);
    body.put("continuous", false);
    return body;
  }
}
