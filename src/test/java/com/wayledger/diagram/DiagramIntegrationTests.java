package com.wayledger.diagram;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.apache.poi.xssf.usermodel.XSSFPicture;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/** The demo site's single-line diagram through the whole application (H2). */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
class DiagramIntegrationTests {

  static final RequestPostProcessor VIEWER = user("vi").roles("VIEWER");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;

  Site demo;
  List<BoardTreeNode> tree;

  @BeforeEach
  void findDemo() {
    demo =
        sites.all().stream()
            .filter(site -> site.getName().equals("Tallow Lane Works"))
            .findFirst()
            .orElseThrow();
    tree = boards.tree(demo.getId());
  }

  private String svgFile() throws Exception {
    return mvc.perform(get("/sites/{id}/diagram.svg", demo.getId()).with(VIEWER))
        .andExpect(status().isOk())
        .andExpect(
            header()
                .string("Content-Disposition", org.hamcrest.Matchers.containsString("attachment")))
        .andReturn()
        .getResponse()
        .getContentAsString(StandardCharsets.UTF_8);
  }

  @Test
  void demoDiagramHasOneNodePerBoardAndOneEdgePerSubmainWithoutOverlap() throws Exception {
    SvgDrawing drawing = SvgDrawing.parse(svgFile());

    assertThat(drawing.boardIds())
        .as("one node per demo board")
        .containsExactlyInAnyOrderElementsOf(
            tree.stream().map(node -> node.board().getId()).toList());
    List<String> expected =
        tree.stream()
            .map(BoardTreeNode::board)
            .filter(board -> board.getParent() != null)
            .map(board -> board.getParent().getId() + "->" + board.getId())
            .toList();
    assertThat(expected).as("the demo has submains").isNotEmpty();
    assertThat(drawing.submains())
        .as("one edge per submain")
        .containsExactlyInAnyOrderElementsOf(expected);
    assertThat(drawing.overlappingBoxes()).as("overlapping board boxes").isEmpty();
  }

  @Test
  void demoDiagramShowsEveryIncomerSubmainCableAndTheSupply() throws Exception {
    SvgDrawing drawing = SvgDrawing.parse(svgFile());
    for (BoardTreeNode node : tree) {
      Board board = node.board();
      String text = drawing.boardText(board.getId());
      assertThat(text)
          .as("board %s names itself", board.getReference())
          .contains(board.getReference());
      if (board.getIncomer() != null && board.getIncomer().getKind() != null) {
        assertThat(text)
            .as("incomer of %s", board.getReference())
            .contains("Incomer " + board.getIncomer().label());
      }
      assertThat(text).as("demand of %s", board.getReference()).contains(" kW");
    }
    String all = drawing.allText();
    assertThat(all).contains("Supply (origin)").contains("TN-C-S").contains("Caution.");
    for (BoardTreeNode node : tree) {
      if (node.board().getParent() != null && node.board().getSubmain() != null) {
        assertThat(all)
            .as("submain cable of %s", node.board().getReference())
            .contains(node.board().getSubmain().label());
      }
    }
    assertThat(all)
        .as("voltage drop at a submain's end")
        .containsPattern("Vd \\d+\\.\\d % from origin");
  }

  @Test
  void pageEmbedsTheDrawingAndExpandsOneBoardsWays() throws Exception {
    Board first = tree.get(0).board();
    String page =
        mvc.perform(
                get("/sites/{id}/diagram", demo.getId())
                    .param("expand", first.getId().toString())
                    .with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString(StandardCharsets.UTF_8);
    // the pan and zoom script, under its content-hashed URL
    assertThat(page)
        .contains("<svg")
        .containsPattern("/js/diagram-[0-9a-f]{32}\\.js")
        .contains("Figures here assist");
    String svg = page.substring(page.indexOf("<svg"), page.indexOf("</svg>") + 6);
    assertThat(SvgDrawing.parse(svg).circuitLinks())
        .as("circuit links of the expanded board")
        .isNotEmpty()
        .allSatisfy(link -> assertThat(link).startsWith("/circuits/"));
    assertThat(page).doesNotContain("style=\"").doesNotContain("onclick");
  }

  @Test
  void unknownSiteIsNotFound() throws Exception {
    mvc.perform(get("/sites/{id}/diagram", 987654).with(VIEWER)).andExpect(status().isNotFound());
  }

  @Test
  void siteWorkbookHasTheDiagramPictureOnItsSecondSheet() throws Exception {
    byte[] xlsx =
        mvc.perform(get("/sites/{id}/export.xlsx", demo.getId()).with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(xlsx))) {
      XSSFSheet sheet = workbook.getSheet("Diagram");
      assertThat(sheet).as("the Diagram sheet").isNotNull();
      assertThat(workbook.getSheetIndex(sheet)).as("placed after the summary").isEqualTo(1);
      assertThat(sheet.getRow(0).getCell(0).getStringCellValue()).startsWith("Figures here assist");
      XSSFDrawing drawing = sheet.getDrawingPatriarch();
      List<XSSFPicture> pictures =
          drawing.getShapes().stream()
              .filter(XSSFPicture.class::isInstance)
              .map(XSSFPicture.class::cast)
              .toList();
      assertThat(pictures).hasSize(1);
      byte[] png = pictures.get(0).getPictureData().getData();
      assertThat(javax.imageio.ImageIO.read(new ByteArrayInputStream(png)))
          .as("a readable PNG")
          .isNotNull();
    }
  }
}
