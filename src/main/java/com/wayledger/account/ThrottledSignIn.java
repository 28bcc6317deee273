package com.wayledger.account;

import java.io.IOException;
import java.time.Clock;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.authentication.AuthenticationFailureHandler;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * The one way users are checked, for the sign-in form and HTTP Basic alike: the stored user and
 * password hash, behind {@link SignInThrottle}. A locked name or address is refused before its
 * password is even compared.
 */
@Configuration
public class ThrottledSignIn {

  /** A sign-in refused because its name or address is locked for a while. */
  public static class Throttled extends AuthenticationException {
    public Throttled() {
      super("Too many failed sign-ins; try again later");
    }
  }

  @Bean
  SignInThrottle signInThrottle(ObjectProvider<Clock> clock) {
    return new SignInThrottle(clock.getIfAvailable(Clock::systemUTC));
  }

  @Bean
  AuthenticationProvider throttledAuthentication(
      AccountService accounts, PasswordEncoder encoder, SignInThrottle throttle) {
    DaoAuthenticationProvider checked = new DaoAuthenticationProvider(accounts);
    checked.setPasswordEncoder(encoder);
    return new AuthenticationProvider() {
      @Override
      public Authentication authenticate(Authentication attempt) {
        String username = attempt.getName();
        String address =
            attempt.getDetails() instanceof WebAuthenticationDetails details
                ? details.getRemoteAddress()
                : null;
        if (throttle.isLocked(username, address)) {
          throw new Throttled();
        }
        try {
          Authentication result = checked.authenticate(attempt);
          throttle.succeeded(username);
          return result;
        } catch (BadCredentialsException
            | org.springframework.security.authentication.DisabledException failed) {
          throttle.failed(username, address);
          throw failed;
        }
      }

      @Override
      public boolean supports(Class<?> authentication) {
        return checked.supports(authentication);
      }
    };
  }

  /** The sign-in form goes back with "?locked" for a lock-out and "?error" for anything else. */
  public static AuthenticationFailureHandler formFailure() {
    return (request, response, exception) -> {
      String query = exception instanceof Throttled ? "?locked" : "?error";
      try {
        response.sendRedirect(request.getContextPath() + "/login" + query);
      } catch (IOException e) {
        throw new java.io.UncheckedIOException(e);
      }
    };
  }
}
