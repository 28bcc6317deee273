package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.system.PagePermissions;
import com.wayledger.system.PagePermissions.Decisions;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.support.StaticListableBeanFactory;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.authority.AuthorityUtils;

/**
 * The page decisions read the roles through the application's role hierarchy, as the security
 * expressions they replace did: admin above editor above viewer.
 */
class PagePermissionsTests {

  private final PagePermissions permissions =
      new PagePermissions(
          new StaticListableBeanFactory(Map.of("roles", SecurityConfig.roleHierarchy()))
              .getBeanProvider(RoleHierarchy.class));

  @Test
  void aViewerIsSignedInAndMayNotEdit() {
    assertThat(permissions.of(signedIn("ROLE_VIEWER")))
        .isEqualTo(new Decisions(true, false, false));
  }

  @Test
  void anEditorMayEditButIsNoAdmin() {
    assertThat(permissions.of(signedIn("ROLE_EDITOR"))).isEqualTo(new Decisions(true, true, false));
  }

  @Test
  void anAdminMayEditThroughTheHierarchy() {
    assertThat(permissions.of(signedIn("ROLE_ADMIN"))).isEqualTo(new Decisions(true, true, true));
  }

  @Test
  void nobodyAndAnAnonymousVisitorAreNotSignedIn() {
    Authentication anonymous =
        new AnonymousAuthenticationToken(
            "key", "anonymousUser", AuthorityUtils.createAuthorityList("ROLE_ANONYMOUS"));
    assertThat(permissions.of(null)).isEqualTo(new Decisions(false, false, false));
    assertThat(permissions.of(anonymous)).isEqualTo(new Decisions(false, false, false));
  }

  private static Authentication signedIn(String role) {
    return UsernamePasswordAuthenticationToken.authenticated(
        "someone", null, AuthorityUtils.createAuthorityList(role));
  }
}
