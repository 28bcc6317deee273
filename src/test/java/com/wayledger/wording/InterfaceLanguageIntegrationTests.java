package com.wayledger.wording;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.account.AccountService;
import com.wayledger.account.Role;
import com.wayledger.account.UserForm;
import java.io.ByteArrayInputStream;
import java.util.UUID;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Which words a page is written in: under "follow the site" an NEC site's board page reads in en-US
 * (panelboard, space) and an IEC site's in en-GB (board, way), whatever the browser says; a user
 * who chose English (UK) reads en-GB everywhere; a page about no site follows Accept-Language
 * between the two. Sites, boards and users are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class InterfaceLanguageIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AccountService accounts;

  private long necBoard;
  private long iecBoard;

  @BeforeEach
  void sitesUnderEachRuleSet() throws Exception {
    necBoard = board(site("NEC", "WYE_208Y_120"));
    iecBoard = board(site("IEC", "IEC_WYE"));
  }

  @Test
  void anNecBoardPageFollowsItsSiteInUsWords() throws Exception {
    String page = page(get("/boards/{id}", necBoard).with(user("vera").roles("VIEWER")));

    assertThat(page)
        .contains("lang=\"en-US\"")
        .contains("Number of spaces")
        .contains("Demand on this panelboard")
        .doesNotContain("Number of ways");
  }

  @Test
  void anIecBoardPageStaysInUkWordsWhateverTheBrowserSays() throws Exception {
    String page =
        page(
            get("/boards/{id}", iecBoard)
                .header("Accept-Language", "en-US")
                .with(user("vera").roles("VIEWER")));

    assertThat(page)
        .contains("lang=\"en-GB\"")
        .contains("Number of ways")
        .contains("Demand on this board")
        .doesNotContain("Number of spaces");
  }

  @Test
  void englishUkChosenOnTheAccountPageShowsBoardAndWayOnAnNecSite() throws Exception {
    String who = storedUser();
    choose(who, "EN_GB", 0).andExpect(status().is3xxRedirection());

    String page = page(get("/boards/{id}", necBoard).with(user(who).roles("VIEWER")));

    // an NEC board is a panelboard drawn by its spaces in either language (space is the
    // panelboard's own word); the surrounding words are the UK ones
    assertThat(page).contains("lang=\"en-GB\"").contains("Demand on this board");
    assertThat(page).doesNotContain("Demand on this panelboard");
  }

  @Test
  void englishUsChosenShowsPanelboardOnAnIecSiteToo() throws Exception {
    String who = storedUser();
    choose(who, "EN_US", 0).andExpect(status().is3xxRedirection());

    assertThat(page(get("/boards/{id}", iecBoard).with(user(who).roles("VIEWER"))))
        .contains("Number of spaces");
  }

  @Test
  void aPageAboutNoSiteFollowsTheBrowserBetweenUkAndUs() throws Exception {
    // The method list's introduction names boards: "A board uses the method it names".
    assertThat(methods("en-US,en;q=0.8"))
        .contains("lang=\"en-US\"")
        .contains("A panelboard uses the method");
    assertThat(methods("en-GB")).contains("lang=\"en-GB\"").contains("A board uses the method");
    assertThat(methods("fr-FR"))
        .as("a language other than the two: the base words, en-GB")
        .contains("lang=\"en-GB\"");
    assertThat(methods(null)).as("no header: en-GB").contains("lang=\"en-GB\"");
  }

  @Test
  void theWorkbookOfABoardReadsInTheWordsOfItsPage() throws Exception {
    try (Workbook nec = workbook(necBoard);
        Workbook iec = workbook(iecBoard)) {
      Sheet necSheet = nec.getSheetAt(0);
      Sheet iecSheet = iec.getSheetAt(0);
      assertThat(necSheet.getRow(0).getCell(0).getStringCellValue())
          .startsWith("Schedule of panelboard ");
      assertThat(necSheet.getRow(1).getCell(4).getStringCellValue()).isEqualTo("Spaces");
      assertThat(iecSheet.getRow(0).getCell(0).getStringCellValue())
          .startsWith("Schedule of board ");
      assertThat(iecSheet.getRow(1).getCell(4).getStringCellValue()).isEqualTo("Ways");
      assertThat(necSheet.getRow(2).getCell(0).getStringCellValue())
          .as("the caution line on the US workbook too")
          .startsWith("Caution: ");
    }
  }

  @Test
  void theAccountPageOffersTheThreeChoicesWithFollowTheSiteFirst() throws Exception {
    String page = page(get("/account").with(user(storedUser()).roles("VIEWER")));

    assertThat(page).containsSubsequence("Follow the site", "English (UK)", "English (US)");
    assertThat(page).contains("value=\"FOLLOW_SITE\" selected");
  }

  @Test
  void aChoiceSavedFromAStalePageIsRefusedBesideTheFieldAndNothingIsStored() throws Exception {
    String who = storedUser();
    choose(who, "EN_US", 0).andExpect(status().is3xxRedirection());

    String refused =
        choose(who, "EN_GB", 0)
            .andExpect(status().isConflict())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(refused).contains("Someone else changed this record after you opened it");
    assertThat(storedLanguage(who)).isEqualTo("EN_US");
    assertThat(version(who)).isEqualTo(1L);
  }

  @Test
  void anUnknownLanguageIsRefusedAsBadInputAndNothingIsStored() throws Exception {
    String who = storedUser();
    choose(who, "KLINGON", 0).andExpect(status().is4xxClientError());

    assertThat(storedLanguage(who)).isEqualTo("FOLLOW_SITE");
    assertThat(version(who)).isZero();
  }

  private org.springframework.test.web.servlet.ResultActions choose(
      String who, String language, long version) throws Exception {
    return mvc.perform(
        post("/account/language")
            .with(user(who).roles("VIEWER"))
            .with(csrf())
            .param("language", language)
            .param("version", String.valueOf(version)));
  }

  private Workbook workbook(long board) throws Exception {
    byte[] xlsx =
        mvc.perform(get("/boards/{id}/export.xlsx", board).with(user("vera").roles("VIEWER")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    return new XSSFWorkbook(new ByteArrayInputStream(xlsx));
  }

  private String methods(String acceptLanguage) throws Exception {
    MockHttpServletRequestBuilder request = get("/methods").with(user("vera").roles("VIEWER"));
    if (acceptLanguage != null) {
      request.header("Accept-Language", acceptLanguage);
    }
    return page(request);
  }

  private String page(MockHttpServletRequestBuilder request) throws Exception {
    return mvc.perform(request)
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private String storedUser() {
    String username = "lang-" + UUID.randomUUID().toString().substring(0, 8);
    accounts.create(new UserForm(username, "Language tester", "long-enough-password", Role.VIEWER));
    return username;
  }

  private String storedLanguage(String who) {
    return jdbc.sql("SELECT interface_language FROM app_user WHERE username = ?")
        .param(who)
        .query(String.class)
        .single();
  }

  private long version(String who) {
    return jdbc.sql("SELECT interface_language_version FROM app_user WHERE username = ?")
        .param(who)
        .query(Long.class)
        .single();
  }

  private long site(String ruleSet, String system) throws Exception {
    String name = "Invented " + ruleSet + " works " + UUID.randomUUID();
    mvc.perform(
            post("/api/sites")
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 230,
                     "phases": 3, "frequencyHertz": 50, "prospectiveFaultCurrentKiloAmps": 10,
                     "ruleSet": "%s", "supplySystem": "%s"}
                    """
                        .formatted(name, ruleSet, system)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private long board(long site) throws Exception {
    String reference = "P" + UUID.randomUUID().toString().substring(0, 6);
    mvc.perform(
            post("/api/sites/{id}/boards", site)
                .with(user("ed").roles("EDITOR"))
                .with(csrf())
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"reference": "%s", "location": "Plant room", "phases": 3, "wayCount": 12,
                     "busbarRatingAmps": 100, "incomerKind": "MCCB", "incomerRatingAmps": 63,
                     "incomerPoles": 3, "incomerBreakingCapacityKiloAmps": 10,
                     "unbalanceLimitPercent": 10, "coincidenceFactor": 1}
                    """
                        .formatted(reference)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .params(site, reference)
        .query(Long.class)
        .single();
  }
}
