package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.account.AppUser;
import com.wayledger.account.AppUserRepository;
import com.wayledger.account.Role;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.lang.reflect.RecordComponent;
import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.UUID;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.test.context.ActiveProfiles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Two saves at the same instant, over real HTTP against the running server, 200 times per pair of
 * paths: two page forms, a page form and the API, two API calls, two edits of one load line, and
 * edits (and load additions) on two different circuits of one board. For one record saved twice
 * from the same version exactly one save wins and the other gets 409 (no lost update, no false
 * conflict, never a 5xx); for two different records both saves win. Each trial starts from the
 * record's current version, fires both requests from a barrier, then reads the record back.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles("test")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
abstract class ConcurrentSavesContract {

  static final int TRIALS = 200;
  private static final String PASSWORD = "concurrent-saves-password";

  @LocalServerPort int port;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AppUserRepository users;

  private final JsonMapper json = JsonMapper.builder().build();
  private final ExecutorService pool = Executors.newFixedThreadPool(2);
  private String alice;
  private String bob;
  private Session aliceSession;
  private Session bobSession;
  private long circuitA;
  private long circuitB;
  private long loadA;

  @BeforeAll
  void usersAndSessions() throws Exception {
    String suffix = UUID.randomUUID().toString().substring(0, 8);
    alice = "alice-" + suffix;
    bob = "bob-" + suffix;
    // A low bcrypt cost keeps 2,000 signed-in API requests cheap; the cost is not under test here.
    BCryptPasswordEncoder cheap = new BCryptPasswordEncoder(4);
    for (String name : List.of(alice, bob)) {
      users.save(new AppUser(name, "{bcrypt}" + cheap.encode(PASSWORD), name, Role.EDITOR));
    }
    aliceSession = signIn(alice);
    bobSession = signIn(bob);
  }

  @AfterAll
  void stopPool() {
    pool.shutdownNow();
  }

  @BeforeEach
  void boardWithTwoCircuits() {
    Site site = sites.create(site());
    Board board = boards.create(site.getId(), board());
    circuitA = schedule.addCircuit(board.getId(), circuit(1, PhasePosition.L1, "Kiln")).getId();
    circuitB = schedule.addCircuit(board.getId(), circuit(2, PhasePosition.L2, "Oven")).getId();
    loadA = schedule.loadsOf(circuitA).get(0).getId();
  }

  @Test
  void twoPageFormsSavingOneCircuit() throws Exception {
    sameRecord(
        "form/form",
        i -> formSaveCircuit(aliceSession, circuitA, "A" + i),
        i -> formSaveCircuit(bobSession, circuitA, "B" + i),
        () -> circuitDescription(circuitA),
        () -> circuitVersion(circuitA));
  }

  @Test
  void aPageFormAndTheApiSavingOneCircuit() throws Exception {
    sameRecord(
        "form/API",
        i -> formSaveCircuit(aliceSession, circuitA, "A" + i),
        i -> apiSaveCircuit(bob, circuitA, "B" + i),
        () -> circuitDescription(circuitA),
        () -> circuitVersion(circuitA));
  }

  @Test
  void twoApiCallsSavingOneCircuit() throws Exception {
    sameRecord(
        "API/API",
        i -> apiSaveCircuit(alice, circuitA, "A" + i),
        i -> apiSaveCircuit(bob, circuitA, "B" + i),
        () -> circuitDescription(circuitA),
        () -> circuitVersion(circuitA));
  }

  @Test
  void twoSavesOfOneLoadLine() throws Exception {
    sameRecord(
        "load/load",
        i -> formSaveLoad(aliceSession, loadA, "A" + i),
        i -> apiSaveLoad(bob, loadA, "B" + i),
        () -> api(alice, "GET", "/api/loads/" + loadA, null).json().get("description").asString(),
        () -> api(alice, "GET", "/api/loads/" + loadA, null).json().get("version").asLong());
  }

  @Test
  void editsOfTwoCircuitsOfOneBoardBothWin() throws Exception {
    List<String> failures = new ArrayList<>();
    for (int i = 0; i < TRIALS; i++) {
      int trial = i;
      Saved[] both =
          together(
              formSaveCircuit(aliceSession, circuitA, "A" + trial),
              apiSaveCircuit(bob, circuitB, "B" + trial));
      if (!both[0].won()
          || !both[1].won()
          || !circuitDescription(circuitA).equals("A" + trial)
          || !circuitDescription(circuitB).equals("B" + trial)) {
        failures.add("trial " + trial + ": " + both[0] + " / " + both[1]);
      }
    }
    assertThat(failures)
        .as("false conflicts or lost edits on two circuits of one board, out of " + TRIALS)
        .isEmpty();
  }

  @Test
  void loadsAddedToTwoCircuitsOfOneBoardBothStored() throws Exception {
    List<String> failures = new ArrayList<>();
    for (int i = 0; i < TRIALS; i++) {
      int trial = i;
      Saved[] both =
          together(
              apiAddLoad(alice, circuitA, "A" + trial), apiAddLoad(bob, circuitB, "B" + trial));
      if (both[0].status() != 201 || both[1].status() != 201) {
        failures.add("trial " + trial + ": " + both[0] + " / " + both[1]);
      }
    }
    assertThat(failures).as("additions refused or failed, out of " + TRIALS).isEmpty();
    assertThat(schedule.loadsOf(circuitA))
        .as("every load added to circuit A is stored, plus its first load")
        .hasSize(TRIALS + 1);
    assertThat(schedule.loadsOf(circuitB)).hasSize(TRIALS + 1);
  }

  // --- one record saved twice from the same version ---

  /** Reads what a save needs (the version the user saw) now; the returned call only sends. */
  interface Save {
    Read<Saved> prepare(int trial) throws Exception;
  }

  interface Read<T> {
    T get() throws Exception;
  }

  private void sameRecord(
      String pair, Save first, Save second, Read<String> stored, Read<Long> version)
      throws Exception {
    List<String> failures = new ArrayList<>();
    Map<Integer, Integer> statuses = new TreeMap<>();
    for (int i = 0; i < TRIALS; i++) {
      int trial = i;
      long before = version.get();
      Saved[] both = together(first.prepare(trial), second.prepare(trial));
      statuses.merge(both[0].status(), 1, Integer::sum);
      statuses.merge(both[1].status(), 1, Integer::sum);
      long winners = java.util.Arrays.stream(both).filter(Saved::won).count();
      long conflicts = java.util.Arrays.stream(both).filter(s -> s.status() == 409).count();
      String expected = both[0].won() ? "A" + trial : "B" + trial;
      if (winners != 1 || conflicts != 1) {
        failures.add("trial " + trial + ": " + both[0] + " / " + both[1]);
      } else if (!stored.get().equals(expected) || version.get() != before + 1) {
        failures.add("trial " + trial + ": stored " + stored.get() + ", winner wrote " + expected);
      }
    }
    assertThat(failures)
        .as(
            pair
                + ": each trial has one winner, one 409 and the winner's value stored (statuses "
                + statuses
                + ")")
        .isEmpty();
  }

  private Saved[] together(Read<Saved> first, Read<Saved> second) throws Exception {
    CyclicBarrier start = new CyclicBarrier(2);
    Future<Saved> a =
        pool.submit(
            () -> {
              start.await(10, TimeUnit.SECONDS);
              return first.get();
            });
    Future<Saved> b =
        pool.submit(
            () -> {
              start.await(10, TimeUnit.SECONDS);
              return second.get();
            });
    return new Saved[] {a.get(30, TimeUnit.SECONDS), b.get(30, TimeUnit.SECONDS)};
  }

  /** A save's answer: won when stored (a redirect after a form, 2xx from the API). */
  record Saved(String path, int status) {
    boolean won() {
      return status >= 200 && status < 400;
    }
  }

  // --- the two paths ---

  private Read<Saved> formSaveCircuit(Session session, long id, String description)
      throws Exception {
    CircuitForm current = CircuitForm.of(schedule.circuit(id));
    Map<String, String> fields = formFields(current);
    fields.put("description", description);
    return () -> new Saved("form", session.post("/circuits/" + id, fields));
  }

  private Read<Saved> apiSaveCircuit(String user, long id, String description) throws Exception {
    JsonNode fields = api(user, "GET", "/api/circuits/" + id, null).json().get("fields");
    ((tools.jackson.databind.node.ObjectNode) fields).put("description", description);
    return () ->
        new Saved("api", api(user, "PUT", "/api/circuits/" + id, fields.toString()).status());
  }

  private Read<Saved> formSaveLoad(Session session, long id, String description) throws Exception {
    JsonNode load = api(alice, "GET", "/api/loads/" + id, null).json();
    Map<String, String> fields = formFields(LoadForm.of(schedule.load(id)));
    fields.put("description", description);
    fields.put("version", load.get("version").asString());
    return () -> new Saved("form", session.post("/loads/" + id, fields));
  }

  private Read<Saved> apiSaveLoad(String user, long id, String description) throws Exception {
    JsonNode load = api(user, "GET", "/api/loads/" + id, null).json();
    LoadForm form = LoadForm.of(schedule.load(id));
    Map<String, Object> body = new LinkedHashMap<>();
    body.put("version", load.get("version").asLong());
    Map<String, Object> fields = new LinkedHashMap<>();
    for (RecordComponent component : LoadForm.class.getRecordComponents()) {
      fields.put(component.getName(), component.getAccessor().invoke(form));
    }
    fields.put("description", description);
    body.put("load", fields);
    String sent = json.writeValueAsString(body);
    return () -> new Saved("api", api(user, "PUT", "/api/loads/" + id, sent).status());
  }

  private Read<Saved> apiAddLoad(String user, long circuitId, String description) {
    String body =
        json.writeValueAsString(
            new LoadForm(
                description,
                LoadCategory.FIXED_APPLIANCE,
                1,
                100.0,
                RatingUnit.W,
                1.0,
                null,
                null,
                false));
    return () ->
        new Saved("api", api(user, "POST", "/api/circuits/" + circuitId + "/loads", body).status());
  }

  private String circuitDescription(long id) {
    return schedule.circuit(id).getDescription();
  }

  private long circuitVersion(long id) {
    return schedule.circuit(id).getVersion();
  }

  private static Map<String, String> formFields(Record form) throws Exception {
    Map<String, String> fields = new LinkedHashMap<>();
    for (RecordComponent component : form.getClass().getRecordComponents()) {
      Object value = component.getAccessor().invoke(form);
      if (value != null) {
        fields.put(component.getName(), value instanceof Enum<?> e ? e.name() : value.toString());
      }
    }
    return fields;
  }

  // --- HTTP ---

  record Answer(int status, String body, JsonMapper mapper) {
    JsonNode json() {
      return mapper.readTree(body);
    }
  }

  private Answer api(String user, String method, String path, String body) throws Exception {
    HttpRequest.Builder request =
        HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
            .timeout(Duration.ofSeconds(30))
            .header(
                "Authorization",
                "Basic "
                    + Base64.getEncoder()
                        .encodeToString((user + ":" + PASSWORD).getBytes(StandardCharsets.UTF_8)))
            .header("Accept", "application/json");
    if (body == null) {
      request.method(method, HttpRequest.BodyPublishers.noBody());
    } else {
      request
          .header("Content-Type", "application/json")
          .method(method, HttpRequest.BodyPublishers.ofString(body));
    }
    HttpResponse<String> response =
        apiClient.send(request.build(), HttpResponse.BodyHandlers.ofString());
    return new Answer(response.statusCode(), response.body(), json);
  }

  private final HttpClient apiClient =
      HttpClient.newBuilder()
          .version(HttpClient.Version.HTTP_1_1)
          .connectTimeout(Duration.ofSeconds(10))
          .build();

  private Session signIn(String user) throws Exception {
    Session session = new Session();
    String page = session.get("/login");
    int status = session.post("/login", Map.of("username", user, "password", PASSWORD), page);
    assertThat(status).as("sign-in of " + user + " redirects").isEqualTo(302);
    session.csrf = csrfIn(session.get("/sites"));
    return session;
  }

  private static String csrfIn(String html) {
    Matcher m =
        Pattern.compile("name=\"_csrf\"\\s+value=\"([^\"]+)\"|value=\"([^\"]+)\"\\s+name=\"_csrf\"")
            .matcher(html);
    if (m.find()) {
      return m.group(1) != null ? m.group(1) : m.group(2);
    }
    Matcher meta = Pattern.compile("\"X-CSRF-TOKEN\"\\s*:\\s*\"([^\"]+)\"").matcher(html);
    assertThat(meta.find()).as("a CSRF token on the page").isTrue();
    return meta.group(1);
  }

  /** A browser-like session: its own cookies and CSRF token. */
  final class Session {
    private final HttpClient client =
        HttpClient.newBuilder()
            .version(HttpClient.Version.HTTP_1_1)
            .cookieHandler(new CookieManager())
            .connectTimeout(Duration.ofSeconds(10))
            .build();
    private String csrf;

    String get(String path) throws Exception {
      HttpResponse<String> response =
          client.send(
              HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
                  .timeout(Duration.ofSeconds(30))
                  .build(),
              HttpResponse.BodyHandlers.ofString());
      return response.body();
    }

    int post(String path, Map<String, String> fields) throws Exception {
      return post(path, fields, null);
    }

    private int post(String path, Map<String, String> fields, String pageWithToken)
        throws Exception {
      Map<String, String> all = new LinkedHashMap<>(fields);
      all.put("_csrf", pageWithToken != null ? csrfIn(pageWithToken) : csrf);
      StringBuilder body = new StringBuilder();
      for (Map.Entry<String, String> field : all.entrySet()) {
        if (!body.isEmpty()) {
          body.append('&');
        }
        body.append(URLEncoder.encode(field.getKey(), StandardCharsets.UTF_8))
            .append('=')
            .append(URLEncoder.encode(field.getValue(), StandardCharsets.UTF_8));
      }
      HttpResponse<String> response =
          client.send(
              HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
                  .timeout(Duration.ofSeconds(30))
                  .header("Content-Type", "application/x-www-form-urlencoded")
                  .POST(HttpRequest.BodyPublishers.ofString(body.toString()))
                  .build(),
              HttpResponse.BodyHandlers.ofString());
      return response.statusCode();
    }
  }

  // --- fixtures (invented) ---

  private static SiteForm site() {
    return new SiteForm(
        "Concurrent saves " + UUID.randomUUID(),
        null,
        EarthingSystem.TN_S,
        230.0,
        3,
        50.0,
        null,
        null,
        null,
        null,
        null,
        null);
  }

  private static BoardForm board() {
    return new BoardForm(
        "DB-Q",
        "Test room",
        3,
        6,
        100.0,
        DeviceKind.MCCB,
        null,
        63.0,
        3,
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

  private static CircuitForm circuit(int way, PhasePosition position, String description) {
    return new CircuitForm(
        way,
        position,
        description,
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        TripCurve.B,
        32.0,
        1,
        6.0,
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
        description,
        LoadCategory.FIXED_APPLIANCE,
        1,
        1000.0,
        RatingUnit.W,
        1.0,
        null,
        null,
        null,
        null);
  }
}
