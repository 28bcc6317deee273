package com.wayledger.hardening;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;

import com.wayledger.account.AccountService;
import java.lang.reflect.Parameter;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.core.annotation.AnnotatedElementUtils;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.AbstractMockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.MockMultipartHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.method.HandlerMethod;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.mvc.method.RequestMappingInfo;
import org.springframework.web.servlet.mvc.method.annotation.RequestMappingHandlerMapping;

/**
 * A seeded generator of bad requests against every route the application maps (found from the
 * handler mapping itself, so a new form or endpoint is covered without editing this test): each
 * route is tried {@link #ROUNDS} times with its own parameter names and the fields of its form or
 * body record filled with hostile values (control characters, text-direction overrides, huge and
 * non-finite numbers, enum positions, wrong JSON types, broken JSON, indexed and nested field
 * names, odd file names and bytes), as administrator, editor, viewer and anonymous. No answer may
 * be a 5xx. The seed is printed and can be fixed with {@code -Dwayledger.fuzz.seed=…}; the number
 * of rounds with {@code -Dwayledger.fuzz.rounds=…}.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
abstract class GeneratedBadInputContract {

  /** Rounds over all routes; about 80 routes, so 30 rounds are about 2,400 requests. */
  static final int ROUNDS = Integer.getInteger("wayledger.fuzz.rounds", 30);

  static final long SEED = Long.getLong("wayledger.fuzz.seed", 20261202L);

  private static final List<String> HOSTILE_TEXT =
      List.of(
          "",
          " ",
          "\u0000",
          "a\u0000b",
          "\u202Egnp.exe",
          "x\u2066y",
          "\t",
          "line\nbreak",
          "\r\n",
          "\u0007bell",
          "\u200B",
          "\uD800",
          "\uDC00x",
          "-1",
          "0",
          "1",
          "3",
          "1e309",
          "-1e309",
          "NaN",
          "Infinity",
          "-Infinity",
          "99999999999999999999",
          "2147483648",
          "-2147483649",
          "9223372036854775808",
          "0x10",
          "1,5",
          "12 A",
          "=1+1",
          "safe;=1+1",
          "@SUM(A1)",
          "'; DROP TABLE site; --",
          "<script>alert(1)</script>",
          "../../etc/passwd",
          "x".repeat(5000),
          "true",
          "on",
          "L1",
          "L4",
          "THREE_POLE",
          "MCB",
          "B",
          "W",
          "DEMAND",
          "valid",
          "all",
          "ADMIN",
          "uk-small-shop",
          "\uFFFF",
          "\uD83D\uDD0C plug");

  private static final List<String> HOSTILE_NAMES =
      List.of(
          "name[0]",
          "reference[]",
          "description.x",
          "class.module.classLoader",
          "x\u0000",
          "version",
          "g0.factor",
          "g99.tiers",
          "column0",
          "column999",
          "sheet",
          "_csrf",
          "\u202Ename");

  private static final List<String> HOSTILE_PATH =
      List.of("0", "-1", "99999999", "abc", "1e3", "99999999999999999999", " ", "%00", "\u202E1");

  private static final List<String> BROKEN_JSON =
      List.of(
          "",
          "{",
          "[]",
          "null",
          "\"text\"",
          "1",
          "{\"a\":}",
          "{\"name\": \"x\"",
          "[".repeat(2000),
          "{\"name\": \"\\u0000\"}",
          "{\"name\": \"\\ud800\"}");

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AccountService accounts;

  @Autowired
  @org.springframework.beans.factory.annotation.Qualifier("requestMappingHandlerMapping")
  RequestMappingHandlerMapping mappings;

  /** One mapped route: method, URL template, what it reads. */
  record Route(
      HttpMethod method,
      String pattern,
      Map<String, Class<?>> params,
      Class<?> body,
      boolean multipart) {}

  @Test
  @Timeout(value = 15, unit = TimeUnit.MINUTES) // a bound on a stuck run, not a speed check
  void noRouteAnswersAServerErrorToGeneratedBadInput() throws Exception {
    Fixture.ensureApiUser(accounts);
    List<Route> routes = routes();
    assertThat(routes).as("routes found").hasSizeGreaterThan(50);
    Random random = new Random(SEED);
    System.out.println("Generated bad input: seed " + SEED + ", " + routes.size() + " routes");
    Fixture fixture = new Fixture(mvc, jdbc);
    List<String> failures = new ArrayList<>();
    Map<Integer, Integer> statuses = new TreeMap<>();
    int requests = 0;
    for (int round = 0; round < ROUNDS; round++) {
      if (round % 5 == 4) {
        fixture = new Fixture(mvc, jdbc); // deletes among the routes may have removed the last one
      }
      for (Route route : routes) {
        AbstractMockHttpServletRequestBuilder<?> request = request(route, fixture, random);
        String described = route.method() + " " + route.pattern();
        requests++;
        try {
          MvcResult result = mvc.perform(request).andReturn();
          int status = result.getResponse().getStatus();
          statuses.merge(status / 100 * 100, 1, Integer::sum);
          if (status >= 500) {
            failures.add(
                status
                    + " "
                    + described
                    + " "
                    + result.getRequest().getParameterMap().keySet()
                    + " → "
                    + result.getResolvedException());
          }
        } catch (Exception | AssertionError thrown) {
          statuses.merge(500, 1, Integer::sum);
          failures.add("thrown " + described + " → " + thrown);
        }
      }
    }
    System.out.println(
        "Generated bad input: " + requests + " requests, by status class " + statuses);
    assertThat(requests).isGreaterThanOrEqualTo(ROUNDS * routes.size());
    assertThat(failures).as("server errors (seed " + SEED + ")").isEmpty();
  }

  private List<Route> routes() {
    List<Route> routes = new ArrayList<>();
    for (Map.Entry<RequestMappingInfo, HandlerMethod> entry :
        mappings.getHandlerMethods().entrySet()) {
      RequestMappingInfo info = entry.getKey();
      HandlerMethod handler = entry.getValue();
      if (!handler.getBeanType().getPackageName().startsWith("com.wayledger")) {
        continue;
      }
      Set<org.springframework.web.bind.annotation.RequestMethod> methods =
          info.getMethodsCondition().getMethods();
      Map<String, Class<?>> params = new LinkedHashMap<>();
      Class<?> body = null;
      boolean multipart = false;
      for (Parameter parameter : handler.getMethod().getParameters()) {
        Class<?> type = parameter.getType();
        if (AnnotatedElementUtils.hasAnnotation(parameter, RequestBody.class)) {
          body = type;
        } else if (AnnotatedElementUtils.hasAnnotation(parameter, PathVariable.class)) {
          continue;
        } else if (MultipartFile.class.isAssignableFrom(type)) {
          multipart = true;
        } else if (AnnotatedElementUtils.hasAnnotation(parameter, RequestParam.class)) {
          RequestParam annotation = parameter.getAnnotation(RequestParam.class);
          String name = annotation.name().isEmpty() ? parameter.getName() : annotation.name();
          if (!Map.class.isAssignableFrom(type)) {
            params.put(name, type);
          }
        } else if (type.isRecord()
            || AnnotatedElementUtils.hasAnnotation(parameter, ModelAttribute.class)) {
          if (type.isRecord()) {
            for (RecordComponent component : type.getRecordComponents()) {
              params.put(component.getName(), component.getType());
            }
          }
        }
      }
      for (String pattern : info.getPatternValues()) {
        if (methods.isEmpty()) {
          routes.add(new Route(HttpMethod.GET, pattern, params, body, multipart));
        }
        for (var method : methods) {
          routes.add(
              new Route(HttpMethod.valueOf(method.name()), pattern, params, body, multipart));
        }
      }
    }
    routes.sort(java.util.Comparator.comparing(r -> r.method() + r.pattern()));
    return routes;
  }

  private AbstractMockHttpServletRequestBuilder<?> request(
      Route route, Fixture fixture, Random random) {
    String url = fill(route.pattern(), fixture, random);
    AbstractMockHttpServletRequestBuilder<?> request;
    if (route.multipart() && random.nextInt(4) > 0) {
      MockMultipartHttpServletRequestBuilder upload =
          MockMvcRequestBuilders.multipart(route.method(), url);
      upload.file(
          new MockMultipartFile(
              "file", pick(random, HOSTILE_TEXT), "application/octet-stream", bytes(random)));
      request = upload;
    } else {
      request = MockMvcRequestBuilders.request(route.method(), url);
    }
    if (route.body() != null) {
      request.contentType(MediaType.APPLICATION_JSON).content(body(route.body(), random));
    } else if (route.method() != HttpMethod.GET && random.nextInt(8) == 0) {
      request.contentType(MediaType.APPLICATION_JSON).content(pick(random, BROKEN_JSON));
    }
    for (Map.Entry<String, Class<?>> param : route.params().entrySet()) {
      if (random.nextInt(10) < 7) {
        request.param(param.getKey(), value(param.getValue(), random));
      }
    }
    if (random.nextInt(5) == 0) {
      request.param(pick(random, HOSTILE_NAMES), pick(random, HOSTILE_TEXT));
    }
    if (random.nextInt(3) == 0) {
      request.header("HX-Request", "true");
    }
    int who = random.nextInt(20);
    if (url.startsWith("/api/")) {
      if (who > 1) {
        request.with(Fixture.api());
      }
    } else if (who == 0) {
      // anonymous
    } else if (who == 1) {
      request.with(user("fuzz-viewer").roles("VIEWER"));
    } else if (who == 2) {
      request.with(user("fuzz-editor").roles("EDITOR"));
    } else {
      request.with(Fixture.pageEditor());
    }
    if (random.nextInt(20) > 0) {
      request.with(csrf());
    }
    return request;
  }

  /** The URL with each variable set to a real record's id, or now and then to a hostile value. */
  private static String fill(String pattern, Fixture fixture, Random random) {
    StringBuilder url = new StringBuilder();
    String[] parts = pattern.split("/");
    for (int i = 1; i < parts.length; i++) {
      String part = parts[i];
      String previous = parts[i - 1];
      String value = part;
      if (part.startsWith("{")) {
        if (random.nextInt(6) == 0) {
          value = encode(pick(random, HOSTILE_PATH));
        } else if (part.equals("{token}")) {
          value = fixture.uploadToken;
        } else if (part.equals("{key}")) {
          value = random.nextBoolean() ? fixture.methodKey : "uk-small-shop";
        } else {
          long id =
              switch (previous) {
                case "sites" -> fixture.siteId;
                case "boards" -> fixture.boardId;
                case "circuits" -> fixture.circuitId;
                case "loads" -> fixture.loadId;
                case "users" -> 1L;
                default -> 1L + random.nextInt(3);
              };
          value = Long.toString(id);
        }
      }
      url.append('/').append(value);
    }
    return url.isEmpty() ? "/" : url.toString();
  }

  private static String encode(String raw) {
    return java.net.URLEncoder.encode(raw, StandardCharsets.UTF_8).replace("+", "%20");
  }

  private static String value(Class<?> type, Random random) {
    if (type.isEnum() && random.nextBoolean()) {
      Object[] constants = type.getEnumConstants();
      return constants[random.nextInt(constants.length)].toString();
    }
    if ((Number.class.isAssignableFrom(type) || type.isPrimitive()) && random.nextBoolean()) {
      return Integer.toString(random.nextInt(200) - 20);
    }
    return pick(random, HOSTILE_TEXT);
  }

  private static String body(Class<?> type, Random random) {
    if (random.nextInt(5) == 0) {
      return pick(random, BROKEN_JSON);
    }
    Map<String, Object> body = new LinkedHashMap<>();
    if (type.isRecord()) {
      for (RecordComponent component : type.getRecordComponents()) {
        if (random.nextInt(10) < 8) {
          body.put(component.getName(), jsonValue(component.getType(), random));
        }
      }
    }
    if (random.nextInt(4) == 0) {
      body.put(pick(random, HOSTILE_NAMES), pick(random, HOSTILE_TEXT));
    }
    return Fixture.JSON.writeValueAsString(body);
  }

  private static Object jsonValue(Class<?> type, Random random) {
    return switch (random.nextInt(9)) {
      case 0 -> null;
      case 1 -> List.of(pick(random, HOSTILE_TEXT));
      case 2 -> Map.of("x", 1);
      case 3 -> random.nextBoolean();
      case 4 -> random.nextInt(5) - 1; // an enum's position, a small number
      case 5 -> random.nextDouble() * 1e12 * (random.nextBoolean() ? 1 : -1);
      case 6 -> {
        if (type.isEnum()) {
          Object[] constants = type.getEnumConstants();
          yield constants[random.nextInt(constants.length)].toString();
        }
        yield random.nextInt(100);
      }
      default -> pick(random, HOSTILE_TEXT);
    };
  }

  private static byte[] bytes(Random random) {
    return switch (random.nextInt(5)) {
      case 0 -> new byte[0];
      case 1 ->
          "Cct,Phase,Description\n1,L1,Li\u0000ghts\n2,L9,=1+1\n".getBytes(StandardCharsets.UTF_8);
      case 2 -> new byte[] {'P', 'K', 3, 4, 0, 0, 0, 0, 1, 2, 3};
      case 3 -> {
        byte[] noise = new byte[random.nextInt(2000)];
        random.nextBytes(noise);
        yield noise;
      }
      default -> "Way\n".repeat(random.nextInt(50)).getBytes(StandardCharsets.UTF_8);
    };
  }

  private static <T> T pick(Random random, List<T> values) {
    return values.get(random.nextInt(values.size()));
  }
}
