package com.wayledger.loadlog;

import java.time.LocalDate;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.context.ActiveProfiles;

/** {@link BackDatedLogChecks} on H2, where the application stamps and chains the entries. */
@SpringBootTest
@ActiveProfiles("test")
class BackDatedLogIntegrationTests extends BackDatedLogChecks {

  @Override
  void rewriteEffectiveDay(long siteId, LocalDate day) {
    jdbc.sql("UPDATE change_log SET effective_on = ? WHERE site_id = ?")
        .params(java.sql.Date.valueOf(day), siteId)
        .update();
  }
}
