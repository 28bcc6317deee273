package com.wayledger.board;

import static org.mockito.BDDMockito.given;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.springframework.test.util.ReflectionTestUtils;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;

/** Stored-looking sites, boards and circuits for controller slices, where no database runs. */
final class PageFixtures {

  static final long SITE_ID = 3;
  static final long BOARD_ID = 5;
  static final long CIRCUIT_ID = 9;

  private PageFixtures() {}

  static Site site() {
    Site site = new Site("Harbour Mill");
    ReflectionTestUtils.setField(site, "id", SITE_ID);
    ReflectionTestUtils.setField(site, "earthingSystem", EarthingSystem.TN_C_S);
    ReflectionTestUtils.setField(site, "nominalVoltageVolts", 230.0);
    ReflectionTestUtils.setField(site, "phases", 3);
    ReflectionTestUtils.setField(site, "frequencyHertz", 50.0);
    return site;
  }

  static BoardForm boardForm(String reference) {
    return new BoardForm(
        reference,
        "Plant room",
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

  static Board board() {
    Board board = new Board(site());
    board.apply(boardForm("DB-P"), null);
    ReflectionTestUtils.setField(board, "id", BOARD_ID);
    return board;
  }

  static Circuit circuit(Board board) {
    Circuit circuit = new Circuit(board);
    circuit.apply(
        new CircuitForm(
            2,
            PhasePosition.L1,
            "Boiler",
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
            8.0,
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
            null));
    ReflectionTestUtils.setField(circuit, "id", CIRCUIT_ID);
    return circuit;
  }

  /**
   * Makes the mocked store hold {@link #board()} (no circuits) on its site, so that the real
   * SchedulePage and AnalysisService can fill the page as they do in the running app. Returns the
   * stored board.
   */
  static Board storeHoldsTheBoard(
      BoardRepository boards, CircuitRepository circuits, SiteService sites) {
    Board board = board();
    given(boards.findById(BOARD_ID)).willReturn(Optional.of(board));
    given(boards.findBySite(SITE_ID)).willReturn(List.of(board));
    given(circuits.findByBoard(BOARD_ID)).willReturn(List.of());
    given(sites.get(SITE_ID)).willReturn(board.getSite());
    return board;
  }

  /** A POST with the given fields (pairs of name and value), each sent once. */
  static MockHttpServletRequestBuilder postForm(
      String url, Map<String, String> base, String... replaced) {
    Map<String, String> fields = new LinkedHashMap<>(base);
    for (int i = 0; i < replaced.length; i += 2) {
      fields.put(replaced[i], replaced[i + 1]);
    }
    MockHttpServletRequestBuilder request = MockMvcRequestBuilders.post(url);
    fields.forEach(request::param);
    return request;
  }

  /** An acceptable board form as the browser posts it. */
  static Map<String, String> boardFields() {
    Map<String, String> fields = new LinkedHashMap<>();
    fields.put("reference", "DB-Q");
    fields.put("location", "Store");
    fields.put("phases", "3");
    fields.put("wayCount", "12");
    fields.put("busbarRatingAmps", "100");
    fields.put("incomerKind", "MCCB");
    fields.put("incomerRatingAmps", "63");
    fields.put("unbalanceLimitPercent", "10");
    fields.put("coincidenceFactor", "1");
    fields.put("submainMaterial", "COPPER");
    return fields;
  }

  /** An acceptable new circuit with a first load, as the inline editor posts it. */
  static Map<String, String> circuitFields() {
    Map<String, String> fields = new LinkedHashMap<>();
    fields.put("wayNumber", "4");
    fields.put("position", "L2");
    fields.put("description", "Kettle point");
    fields.put("status", "IN_USE");
    fields.put("deviceKind", "MCB");
    fields.put("deviceCurve", "B");
    fields.put("deviceRatingAmps", "16");
    fields.put("deviceBreakingCapacityKiloAmps", "6");
    fields.put("cableMaterial", "COPPER");
    fields.put("cableInsulation", "THERMOPLASTIC_70");
    fields.put("loadDescription", "Kettle");
    fields.put("loadCategory", "FIXED_APPLIANCE");
    fields.put("loadQuantity", "1");
    fields.put("loadRatingValue", "3000");
    fields.put("loadRatingUnit", "W");
    fields.put("loadPowerFactor", "1");
    fields.put("_lockedForBalancing", "on");
    return fields;
  }

  /** An acceptable load line. */
  static Map<String, String> loadFields() {
    Map<String, String> fields = new LinkedHashMap<>();
    fields.put("description", "Toaster");
    fields.put("category", LoadCategory.FIXED_APPLIANCE.name());
    fields.put("quantity", "1");
    fields.put("ratingValue", "2200");
    fields.put("ratingUnit", RatingUnit.W.name());
    fields.put("powerFactor", "1");
    fields.put("_continuous", "on");
    return fields;
  }

  /** The board page as a signed-in user of the given role reads it (HTTP 200 asserted). */
  static String boardPage(MockMvc mvc, long boardId, String name, String role) throws Exception {
    return mvc.perform(
            MockMvcRequestBuilders.get("/boards/{id}", boardId)
                .with(
                    org.springframework.security.test.web.servlet.request
                        .SecurityMockMvcRequestPostProcessors.user(name)
                        .roles(role)))
        .andExpect(
            org.springframework.test.web.servlet.result.MockMvcResultMatchers.status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }
}
