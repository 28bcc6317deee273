package com.wayledger.board;

import static com.wayledger.board.PageFixtures.BOARD_ID;
import static com.wayledger.board.PageFixtures.SITE_ID;
import static com.wayledger.board.PageFixtures.board;
import static com.wayledger.board.PageFixtures.boardFields;
import static com.wayledger.board.PageFixtures.postForm;
import static com.wayledger.board.PageFixtures.storeHoldsTheBoard;
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
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import com.wayledger.account.SecurityConfig;
import com.wayledger.diversity.MethodLibrary;
import com.wayledger.diversity.StoredMethodRepository;
import com.wayledger.site.SiteService;
import com.wayledger.system.RuleViolation;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.webmvc.test.autoconfigure.WebMvcTest;
import org.springframework.context.annotation.Import;
import org.springframework.test.context.bean.override.mockito.MockitoBean;
import org.springframework.test.web.servlet.MockMvc;

/** The site page with its board tree, the board page and the board forms. */
@WebMvcTest(BoardController.class)
@Import({SecurityConfig.class, MethodLibrary.class, SchedulePage.class, AnalysisService.class})
class BoardControllerIntegrationTests {

  @Autowired MockMvc mvc;
  @MockitoBean BoardService boards;
  @MockitoBean StoredMethodRepository storedMethods;
  @MockitoBean com.wayledger.system.RowLocks rowLocks;
  @MockitoBean SiteService sites;
  @MockitoBean BoardRepository boardRepository;
  @MockitoBean CircuitRepository circuitRepository;
  @MockitoBean DwellingRepository dwellingRepository;
  @MockitoBean MeasuredDemandRepository measuredDemandRepository;

  @BeforeEach
  void storedBoard() {
    storeHoldsTheBoard(boardRepository, circuitRepository, sites);
  }

  @Test
  void viewerSeesTheSiteWithItsBoardTree() throws Exception {
    given(boards.tree(SITE_ID)).willReturn(List.of(new BoardTreeNode(board(), 0)));

    mvc.perform(get("/sites/{id}", SITE_ID).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(view().name("board/site"))
        .andExpect(model().attribute("tree", hasSize(1)))
        .andExpect(content().string(containsString("DB-P")));
  }

  @Test
  void viewerSeesTheBoardScheduleWithoutEditButtons() throws Exception {
    mvc.perform(get("/boards/{id}", BOARD_ID).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(view().name("board/board"))
        .andExpect(content().string(containsString("id=\"pos-6-L3\"")))
        .andExpect(
            content().string(org.hamcrest.Matchers.not(containsString("class=\"small add\""))));
  }

  @Test
  void editorSeesAnAddButtonOnFreePositions() throws Exception {
    mvc.perform(get("/boards/{id}", BOARD_ID).with(editor()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("class=\"small add\"")));
  }

  @Test
  void unknownBoardIsNotFound() throws Exception {
    mvc.perform(get("/boards/404").with(viewer()))
        .andExpect(status().isNotFound())
        .andExpect(view().name("error/problem"));
  }

  @Test
  void anonymousVisitorIsSentToSignIn() throws Exception {
    mvc.perform(get("/boards/{id}", BOARD_ID))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/login"));
  }

  @Test
  void editorOpensTheNewBoardForm() throws Exception {

    mvc.perform(get("/sites/{id}/boards/new", SITE_ID).with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name("board/form"))
        .andExpect(model().attribute("form", BoardForm.blank(3)));
  }

  @Test
  void viewerCannotOpenTheNewBoardForm() throws Exception {
    mvc.perform(get("/sites/{id}/boards/new", SITE_ID).with(viewer()))
        .andExpect(status().isForbidden());
  }

  @Test
  void viewerCannotOpenTheBoardEditForm() throws Exception {
    mvc.perform(get("/boards/{id}/edit", BOARD_ID).with(viewer()))
        .andExpect(status().isForbidden());
  }

  @Test
  void editorOpensTheBoardEditFormFilledFromTheBoard() throws Exception {
    given(boards.get(BOARD_ID)).willReturn(board());

    mvc.perform(get("/boards/{id}/edit", BOARD_ID).with(editor()))
        .andExpect(status().isOk())
        .andExpect(view().name("board/form"))
        .andExpect(model().attribute("form", BoardForm.of(board())));
  }

  @Test
  void savedBoardRedirectsToItsPage() throws Exception {
    given(boards.create(eq(SITE_ID), any(), any())).willReturn(board());

    mvc.perform(postForm("/sites/3/boards", boardFields()).with(editor()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/boards/" + BOARD_ID));
  }

  @Test
  void zeroWaysComesBackWith422AndTheMessage() throws Exception {

    mvc.perform(
            postForm("/sites/3/boards", boardFields(), "wayCount", "0").with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(view().name("board/form"))
        .andExpect(model().attributeHasFieldErrorCode("form", "wayCount", "Min"))
        .andExpect(
            content()
                .string(
                    containsString(
                        "<p class=\"error\" id=\"wayCount-error\">Must be at least 1.</p>")));
    verify(boards, never()).create(anyLong(), any());
  }

  @Test
  void lettersForTheNumberOfWaysKeepTheReferenceTyped() throws Exception {

    mvc.perform(
            postForm("/sites/3/boards", boardFields(), "wayCount", "twelve")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "wayCount", "typeMismatch"))
        .andExpect(content().string(containsString("value=\"DB-Q\"")))
        .andExpect(content().string(containsString("Please enter a whole number.")));
    verify(boards, never()).create(anyLong(), any());
  }

  @Test
  void coincidenceFactorAboveOneIsRefused() throws Exception {

    mvc.perform(
            postForm("/sites/3/boards", boardFields(), "coincidenceFactor", "1.5")
                .with(editor())
                .with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "coincidenceFactor", "DecimalMax"));
    verify(boards, never()).create(anyLong(), any());
  }

  @Test
  void ruleBrokenInTheServiceShowsBesideItsField() throws Exception {
    given(boards.create(eq(SITE_ID), any(), any()))
        .willThrow(new RuleViolation("reference", "board.reference.taken"));

    mvc.perform(postForm("/sites/3/boards", boardFields()).with(editor()).with(csrf()))
        .andExpect(status().is(422))
        .andExpect(model().attributeHasFieldErrorCode("form", "reference", "board.reference.taken"))
        .andExpect(
            content()
                .string(containsString("Another board on this site already has this reference.")));
  }

  @Test
  void postWithoutCsrfTokenIsRefused() throws Exception {
    mvc.perform(postForm("/sites/3/boards", boardFields()).with(editor()))
        .andExpect(status().isForbidden());
    verify(boards, never()).create(anyLong(), any());
  }

  @Test
  void viewerCannotCreateOrChangeOrDeleteABoard() throws Exception {
    mvc.perform(postForm("/sites/3/boards", boardFields()).with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(postForm("/boards/5", boardFields()).with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    mvc.perform(post("/boards/5/delete").with(viewer()).with(csrf()))
        .andExpect(status().isForbidden());
    verify(boards, never()).create(anyLong(), any());
    verify(boards, never()).update(anyLong(), any());
    verify(boards, never()).delete(anyLong());
  }

  @Test
  void boardThatFeedsOthersIsKeptWithTheReason() throws Exception {
    given(boards.delete(eq(BOARD_ID), any()))
        .willThrow(new RuleViolation("reference", "board.delete.hasChildren"));

    mvc.perform(post("/boards/5/delete").with(editor()).with(csrf()))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/boards/5"))
        .andExpect(flash().attribute("problem", "board.delete.hasChildren"));
  }
}
