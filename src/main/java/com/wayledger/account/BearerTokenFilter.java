package com.wayledger.account;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Optional;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.core.context.SecurityContextHolderStrategy;
import org.springframework.security.web.context.RequestAttributeSecurityContextRepository;
import org.springframework.security.web.context.SecurityContextRepository;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Signs an API request in from {@code Authorization: Bearer <token>} (see {@link ApiTokens}). A
 * request without that header passes on untouched, so HTTP Basic still works; a presented token
 * that is unknown or revoked is refused with 401 at once and never falls back to anything else.
 * Part of the API filter chain only (SecurityConfig), not a servlet filter of its own.
 */
final class BearerTokenFilter extends OncePerRequestFilter {

  private static final String BEARER = "Bearer ";

  private final ObjectProvider<ApiTokens> tokens;
  private final SecurityContextHolderStrategy contexts =
      SecurityContextHolder.getContextHolderStrategy();
  private final SecurityContextRepository repository =
      new RequestAttributeSecurityContextRepository();

  /** The tokens are looked up when a request needs them (a web slice test may have none). */
  BearerTokenFilter(ObjectProvider<ApiTokens> tokens) {
    this.tokens = tokens;
  }

  @Override
  protected void doFilterInternal(
      HttpServletRequest request, HttpServletResponse response, FilterChain chain)
      throws ServletException, IOException {
    String header = request.getHeader("Authorization");
    if (header == null || !header.regionMatches(true, 0, BEARER, 0, BEARER.length())) {
      chain.doFilter(request, response);
      return;
    }
    ApiTokens known = tokens.getIfAvailable();
    Optional<Authentication> who =
        known == null
            ? Optional.empty()
            : known.authenticate(header.substring(BEARER.length()).strip());
    if (who.isEmpty()) {
      refuse(response);
      return;
    }
    SecurityContext context = contexts.createEmptyContext();
    context.setAuthentication(who.get());
    contexts.setContext(context);
    repository.saveContext(context, request, response);
    chain.doFilter(request, response);
  }

  private static void refuse(HttpServletResponse response) throws IOException {
    response.setStatus(HttpServletResponse.SC_UNAUTHORIZED);
    response.setHeader("WWW-Authenticate", "Bearer error=\"invalid_token\"");
    response.setContentType("application/problem+json");
    response.setCharacterEncoding(StandardCharsets.UTF_8.name());
    response
        .getWriter()
        .write(
            "{\"title\":\"Unauthorized\",\"status\":401,"
                + "\"detail\":\"The API token is unknown or has been revoked.\"}");
  }
}
