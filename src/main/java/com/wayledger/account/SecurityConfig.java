package com.wayledger.account;

import org.springframework.beans.factory.ObjectProvider;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpMethod;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.access.hierarchicalroles.RoleHierarchyImpl;
import org.springframework.security.config.Customizer;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.crypto.factory.PasswordEncoderFactories;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.authentication.www.BasicAuthenticationFilter;
import org.springframework.security.web.context.RequestAttributeSecurityContextRepository;

/**
 * Who may do what. Pages: form sign-in, session in the database, CSRF on every form. API: a
 * personal token ({@code Authorization: Bearer}) or HTTP Basic on each request and no session, so a
 * browser's cookie never authorises an API call (and CSRF cannot apply there). Reading needs any
 * role; changing needs editor; managing users needs admin.
 */
@Configuration
public class SecurityConfig {

  private static final String[] CHANGES = {
    "/sites/**", "/boards/**", "/circuits/**", "/loads/**", "/methods/**"
  };

  @Bean
  PasswordEncoder passwordEncoder() {
    return PasswordEncoderFactories.createDelegatingPasswordEncoder();
  }

  @Bean
  static RoleHierarchy roleHierarchy() {
    return RoleHierarchyImpl.fromHierarchy("ROLE_ADMIN > ROLE_EDITOR\nROLE_EDITOR > ROLE_VIEWER");
  }

  @Bean
  @Order(1)
  SecurityFilterChain api(HttpSecurity http, ObjectProvider<ApiTokens> tokens) throws Exception {
    http.securityMatcher("/api/**")
        .authorizeHttpRequests(
            auth ->
                auth.requestMatchers(
                        HttpMethod.GET,
                        "/api/openapi",
                        "/api/openapi/**",
                        "/api/docs",
                        "/api/docs/**",
                        "/api/swagger-ui/**")
                    .permitAll()
                    .requestMatchers(HttpMethod.GET, "/api/**")
                    .hasRole("VIEWER")
                    .anyRequest()
                    .hasRole("EDITOR"))
        // Personal API tokens (fast: one SHA-256 and one indexed look-up); HTTP Basic stays as the
        // slow path (bcrypt of the password on every request).
        .addFilterBefore(new BearerTokenFilter(tokens), BasicAuthenticationFilter.class)
        .httpBasic(Customizer.withDefaults())
        .headers(SecurityHeaders::apply)
        .csrf(csrf -> csrf.disable())
        .sessionManagement(
            session -> session.sessionCreationPolicy(SessionCreationPolicy.STATELESS))
        .securityContext(
            context ->
                context.securityContextRepository(new RequestAttributeSecurityContextRepository()));
    return http.build();
  }

  @Bean
  @Order(2)
  SecurityFilterChain pages(HttpSecurity http) throws Exception {
    http.authorizeHttpRequests(
            auth ->
                auth.requestMatchers(
                        "/login",
                        "/css/**",
                        "/js/**",
                        "/webjars/**",
                        "/favicon*.svg",
                        "/actuator/health",
                        "/error")
                    .permitAll()
                    .requestMatchers("/admin/**")
                    .hasRole("ADMIN")
                    .requestMatchers(HttpMethod.POST, CHANGES)
                    .hasRole("EDITOR")
                    .requestMatchers(
                        HttpMethod.GET,
                        "/sites/new",
                        "/sites/*/edit",
                        "/sites/*/boards/new",
                        "/boards/*/edit",
                        "/boards/*/circuits/new",
                        "/circuits/*/edit",
                        "/loads/*/edit",
                        "/boards/*/import",
                        "/boards/*/import/**",
                        "/boards/*/inspections/new",
                        "/boards/*/inspections/import",
                        "/boards/*/inspections/import/**")
                    .hasRole("EDITOR")
                    .anyRequest()
                    .hasRole("VIEWER"))
        .formLogin(
            form ->
                form.loginPage("/login")
                    .defaultSuccessUrl("/sites", false)
                    .failureHandler(ThrottledSignIn.formFailure())
                    .permitAll())
        .logout(logout -> logout.logoutSuccessUrl("/login?signedOut"))
        .headers(SecurityHeaders::apply);
    return http.build();
  }
}
