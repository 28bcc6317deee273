package com.wayledger.board;

import static com.wayledger.board.PageFixtures.BOARD_ID;
import static com.wayledger.board.PageFixtures.CIRCUIT_ID;
import static com.wayledger.board.PageFixtures.board;
import static com.wayledger.board.PageFixtures.circuit;
import static com.wayledger.board.PageFixtures.circuitFields;
import static com.wayledger.board.PageFixtures.loadFields;
import static com.wayledger.board.PageFixtures.postForm;
import static com.wayledger.board.PageFixtures.storeHoldsTheBoard;
import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.hamcrest.Matchers.containsString;
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
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import com.wayledger.account.SecurityConfig;
import com.wayledger.diversity.MethodLibrary;
import com.wayledger.diversity.StoredMethodRepository;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.SiteService;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.webmvc.test.autoconfigure.WebMvcTest;
import org.springframework.context.annotation.Import;
import org.springframework.test.context.bean.override.mockito.MockitoBean;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Inline editing of the schedule: the htmx fragments, whole-page fallbacks, roles and bad input.
 */
@WebMvcTest(ScheduleController.class)
@Import({SecurityConfig.class, MethodLibrary.class, SchedulePage.class, AnalysisService.class})
class ScheduleControllerIntegrationTests {

  private static final String EDITOR_FRAGMENT = "board/schedule :: circuitEditor";
  private static final String SCHEDULE_FRAGMENT = "board/schedule :: scheduleTable";
  private static final String SCHEDULE_UPDATE = "board/schedule :: scheduleUpdate";

  @Autowired MockMvc mvc;
  @MockitoBean ScheduleService schedule;
  @MockitoBean StoredMethodRepository storedMethods;
  @MockitoBean com.wayledger.system.RowLocks rowLocks;
  @MockitoBean BoardService boards;
  @MockitoBean SiteService sites;
  @MockitoBean BoardRepository boardRepository;
  @MockitoBean CircuitRepository circuitRepository;
  @MockitoBean DwellingRepository dwellingRepository;
  @MockitoBean MeasuredDemandRepository measuredDemandRepository;

  @BeforeEach
  void storedBoard() {
    Board board = storeHoldsTheBoard(boardRepository, circuitRepository, sites);
    given(boards.get(BOARD_ID)).willReturn(board);
  }

  private void storedCircuit() {
    Circuit circuit = circuit(board());
    given(schedule.circuit(CIRCUIT_ID)).willReturn(circuit);
    given(schedule.loadsOf(CIRCUIT_ID)).willReturn(List.of());
  }

  @Test
  void addButtonOpensTheEditorRowForThatPosition() throws Exception {
    mvc.perform(
            get("/boards/5/circuits/new")
                .param("way", "4")
                .param("position", "L2")
                .header("HX-Request", "true")
                .with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name(EDITOR_FRAGMENT))
        .andExpect(model().attribute("form", CircuitForm.blankAt(4, PhasePosition.L2)))
        .andExpect(content().string(containsString("id=\"editor-4-L2\"")));
  }

  @Test
  void withoutHtmxTheEditorIsAWholePage() throws Exception {
    mvc.perform(
            get("/boards/5/circuits/new").param("way", "4").param("position", "L2").with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name("board/circuit"))
        .andExpect(content().string(containsString("<footer class=\"caution\"")));
  }

  @Test
  void unknownPositionNameIsABadRequest() throws Exception {
    mvc.perform(
            get("/boards/5/circuits/new").param("way", "4").param("position", "L4").with(editor()))
        .andExpect(status().isBadRequest())
        .andExpect(view().name("error/problem"));
  }

  @Test
  void viewerCannotOpenTheCircuitEditors() throws Exception {
    storedCircuit();
    mvc.perform(
            get("/boards/5/circuits/new").param("way", "4").param("position", "L2").with(viewer()))
        .andExpect(status().isForbidden());
    mvc.perform(get("/circuits/{id}/edit", CIRCUIT_ID).with(viewer()))
        .andExpect(status().isForbidden());
    mvc.perform(get("/loads/1/edit").with(viewer())).andExpect(status().isForbidden());
  }

  @Test
  void viewerMayReloadTheScheduleTable() throws Exception {
    mvc.perform(get("/boards/5/schedule").with(viewer()))
        .andExpect(status().isOk())
        .andExpect(view().name(SCHEDULE_FRAGMENT));
  }

  @Test
  void anonymousVisitorIsSentToSignIn() throws Exception {
    mvc.perform(get("/boards/5/schedule"))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/login"));
  }

  @Test
  void savedCircuitSwapsTheWholeScheduleTableIn() throws Exception {
    Circuit saved = circuit(board());
    given(schedule.addCircuit(eq(BOARD_ID), any(), any())).willReturn(saved);

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields())
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().isOk())
        .andExpect(view().name(SCHEDULE_UPDATE))
        .andExpect(header().string("HX-Retarget", "#schedule"))
        .andExpect(header().string("HX-Reswap", "outerHTML"));
    verify(schedule)
        .addCircuit(eq(BOARD_ID), any(CircuitForm.class), any()); // loadlog: reason passed through
  }

  @Test
  void ringTickReachesTheFormAndItsAbsenceMeansRadial() throws Exception {
    given(schedule.addCircuit(eq(BOARD_ID), any(), any())).willReturn(circuit(board()));

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "ringFinal", "true", "_ringFinal", "on")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    verify(schedule)
        .addCircuit(
            eq(BOARD_ID),
            org.mockito.ArgumentMatchers.argThat(f -> Boolean.TRUE.equals(f.ringFinal())),
            any());

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "_ringFinal", "on")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    verify(schedule)
        .addCircuit(
            eq(BOARD_ID),
            org.mockito.ArgumentMatchers.argThat(f -> !Boolean.TRUE.equals(f.ringFinal())),
            any());
  }

  @Test
  void locationChoiceReachesTheFormAndBlankMeansNotRecorded() throws Exception {
    given(schedule.addCircuit(eq(BOARD_ID), any(), any())).willReturn(circuit(board()));

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "location", "BATH_OR_SHOWER")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    verify(schedule)
        .addCircuit(
            eq(BOARD_ID),
            org.mockito.ArgumentMatchers.argThat(
                f -> f.location() == com.wayledger.engine.CircuitLocation.BATH_OR_SHOWER),
            any());

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "location", "")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    verify(schedule)
        .addCircuit(
            eq(BOARD_ID), org.mockito.ArgumentMatchers.argThat(f -> f.location() == null), any());
  }

  @Test
  void withoutHtmxASavedCircuitRedirectsToTheBoard() throws Exception {
    given(schedule.addCircuit(eq(BOARD_ID), any(), any())).willReturn(circuit(board()));

    mvc.perform(postForm("/boards/5/circuits", circuitFields()).with(editor()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/boards/5"));
  }

  @Test
  void lettersInTheLoadRatingComeBackBesideTheFieldWith422() throws Exception {
    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "loadRatingValue", "abc")
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name(EDITOR_FRAGMENT))
        .andExpect(model().attributeHasFieldErrorCode("form", "loadRatingValue", "typeMismatch"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"loadRatingValue-error\">Please enter a number, such as 2.5.</p>")))
        .andExpect(content().string(containsString("value=\"Kettle point\"")));
    verify(schedule, never()).addCircuit(anyLong(), any());
  }

  @Test
  void blankDescriptionIsRefused() throws Exception {
    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "description", "")
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "description", "NotBlank"))
        .andExpect(content().string(containsString("Please fill this in.")));
    verify(schedule, never()).addCircuit(anyLong(), any());
  }

  @Test
  void negativeDeviceRatingIsRefused() throws Exception {
    mvc.perform(
            postForm("/boards/5/circuits", circuitFields(), "deviceRatingAmps", "-16")
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "deviceRatingAmps", "Positive"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"deviceRatingAmps-error\">Must be greater than zero.</p>")));
  }

  @Test
  void occupiedPositionShowsTheRuleBesideTheWayNumber() throws Exception {
    given(schedule.addCircuit(eq(BOARD_ID), any(), any()))
        .willThrow(new RuleViolation("wayNumber", "circuit.position.occupied", 4, "L2"));

    mvc.perform(
            postForm("/boards/5/circuits", circuitFields())
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name(EDITOR_FRAGMENT))
        .andExpect(
            model().attributeHasFieldErrorCode("form", "wayNumber", "circuit.position.occupied"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"wayNumber-error\">Way 4 L2 already holds a circuit.</p>")));
  }

  @Test
  void postWithoutCsrfTokenIsRefused() throws Exception {
    mvc.perform(
            postForm("/boards/5/circuits", circuitFields())
                .header("HX-Request", "true")
                .with(editor()))
        .andExpect(status().isForbidden());
    verify(schedule, never()).addCircuit(anyLong(), any());
  }

  @Test
  void viewerCannotChangeTheSchedule() throws Exception {
    storedCircuit();
    mvc.perform(postForm("/boards/5/circuits", circuitFields()).with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(postForm("/circuits/9", circuitFields()).with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(post("/circuits/9/delete").with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(postForm("/circuits/9/loads", loadFields()).with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(post("/loads/1/delete").with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    verify(schedule, never()).addCircuit(anyLong(), any());
    verify(schedule, never()).updateCircuit(anyLong(), any());
    verify(schedule, never()).deleteCircuit(anyLong());
    verify(schedule, never()).addLoad(anyLong(), any());
    verify(schedule, never()).deleteLoad(anyLong());
  }

  @Test
  void editingAnUnknownCircuitIsNotFound() throws Exception {
    given(schedule.circuit(404)).willThrow(new NotFoundException("Circuit", 404));

    mvc.perform(get("/circuits/404/edit").with(editor())).andExpect(status().isNotFound());
    mvc.perform(postForm("/circuits/404", circuitFields()).with(editor()).with(csrf()))
        .andExpect(status().isNotFound());
    verify(schedule, never()).updateCircuit(anyLong(), any());
  }

  @Test
  void powerFactorAboveOneOnALoadIsRefused() throws Exception {
    storedCircuit();

    mvc.perform(
            postForm("/circuits/9/loads", loadFields(), "powerFactor", "1.5")
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name(EDITOR_FRAGMENT))
        .andExpect(model().attributeHasFieldErrorCode("loadForm", "powerFactor", "DecimalMax"))
        .andExpect(content().string(containsString("Power factor must be above 0 and at most 1.")));
    verify(schedule, never()).addLoad(anyLong(), any());
  }

  @Test
  void savedLoadRedrawsTheEditorRow() throws Exception {
    storedCircuit();

    mvc.perform(
            postForm("/circuits/9/loads", loadFields())
                .header("HX-Request", "true")
                .with(editor())
                .with(csrf()))
        .andExpect(status().isOk())
        .andExpect(view().name(EDITOR_FRAGMENT))
        .andExpect(model().attribute("loadForm", LoadForm.blank()));
    verify(schedule)
        .addLoad(eq(CIRCUIT_ID), any(LoadForm.class), any()); // loadlog: reason passed through
  }
}
