package com.wayledger.system;

import java.util.Collection;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.security.access.hierarchicalroles.NullRoleHierarchy;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.authentication.AuthenticationTrustResolver;
import org.springframework.security.authentication.AuthenticationTrustResolverImpl;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ModelAttribute;

/**
 * What the signed-in user may do, decided once per request and put in every page's model, so that
 * templates test a boolean instead of parsing and evaluating a security expression per use: {@code
 * signedIn} (the main menu), {@code canEdit} (editors and admins: every edit control) and {@code
 * isAdmin} (the user administration link). The roles are read through the application's role
 * hierarchy (account.SecurityConfig: admin above editor above viewer), as {@code hasRole} read
 * them. The pages are only what a user sees: every change is still refused on the server to a role
 * that may not make it.
 */
@ControllerAdvice
public class PagePermissions {

  private static final String EDITOR = "ROLE_EDITOR";
  private static final String ADMIN = "ROLE_ADMIN";

  private final RoleHierarchy roles;
  private final AuthenticationTrustResolver trust = new AuthenticationTrustResolverImpl();

  public PagePermissions(ObjectProvider<RoleHierarchy> roles) {
    this.roles = roles.getIfAvailable(NullRoleHierarchy::new);
  }

  /**
   * The decisions for one user.
   *
   * @param signedIn whether someone is signed in (not anonymous)
   * @param canEdit whether they hold the editor role (or one above it)
   * @param isAdmin whether they hold the admin role
   */
  public record Decisions(boolean signedIn, boolean canEdit, boolean isAdmin) {}

  /** The decisions for an authentication (null: nobody). */
  public Decisions of(Authentication authentication) {
    if (!trust.isAuthenticated(authentication)) {
      return new Decisions(false, false, false);
    }
    boolean editor = false;
    boolean admin = false;
    Collection<? extends GrantedAuthority> reachable =
        roles.getReachableGrantedAuthorities(authentication.getAuthorities());
    for (GrantedAuthority authority : reachable) {
      editor |= EDITOR.equals(authority.getAuthority());
      admin |= ADMIN.equals(authority.getAuthority());
    }
    return new Decisions(true, editor, admin);
  }

  /** Puts the current user's decisions in a page's model (also used by the error pages). */
  @ModelAttribute
  public void addTo(Model model) {
    Decisions decisions = of(SecurityContextHolder.getContext().getAuthentication());
    model.addAttribute("signedIn", decisions.signedIn());
    model.addAttribute("canEdit", decisions.canEdit());
    model.addAttribute("isAdmin", decisions.isAdmin());
  }
}
