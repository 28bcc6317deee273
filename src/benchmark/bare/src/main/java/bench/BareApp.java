package bench;

import java.util.List;
import java.util.stream.IntStream;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.context.annotation.Bean;
import org.springframework.core.annotation.Order;
import org.springframework.security.config.Customizer;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.crypto.factory.PasswordEncoderFactories;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.provisioning.InMemoryUserDetailsManager;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ResponseBody;

/** The bare comparison app: same starters and security shape as Wayledger, a trivial workload. */
@SpringBootApplication
@Controller
public class BareApp {

  public record Row(int number, String name, double amps, String note) {}

  public static void main(String[] args) {
    SpringApplication.run(BareApp.class, args);
  }

  @GetMapping("/table")
  String table(Model model) {
    model.addAttribute(
        "rows",
        IntStream.rangeClosed(1, 100)
            .mapToObj(i -> new Row(i, "Row " + i, i * 1.5, i % 3 == 0 ? "third" : "other"))
            .toList());
    return "table";
  }

  @GetMapping({"/api/rows", "/open/rows"})
  @ResponseBody
  List<Row> rows() {
    return List.of(new Row(1, "one", 1.5, "a"), new Row(2, "two", 3.0, "b"), new Row(3, "three", 4.5, "c"));
  }

  @Bean
  PasswordEncoder passwordEncoder() {
    return PasswordEncoderFactories.createDelegatingPasswordEncoder();
  }

  @Bean
  UserDetailsService users(PasswordEncoder encoder) {
    return new InMemoryUserDetailsManager(
        User.withUsername("bench").password(encoder.encode("bench-password")).roles("VIEWER").build());
  }

  @Bean
  @Order(1)
  SecurityFilterChain api(HttpSecurity http) throws Exception {
    http.securityMatcher("/api/**")
        .authorizeHttpRequests(auth -> auth.anyRequest().hasRole("VIEWER"))
        .httpBasic(Customizer.withDefaults())
        .csrf(csrf -> csrf.disable())
        .sessionManagement(s -> s.sessionCreationPolicy(SessionCreationPolicy.STATELESS));
    return http.build();
  }

  @Bean
  @Order(2)
  SecurityFilterChain pages(HttpSecurity http) throws Exception {
    http.authorizeHttpRequests(
            auth -> auth.requestMatchers("/login", "/open/**").permitAll().anyRequest().hasRole("VIEWER"))
        .formLogin(form -> form.loginPage("/login").permitAll());
    return http.build();
  }

  @GetMapping("/login")
  String login() {
    return "login";
  }
}
