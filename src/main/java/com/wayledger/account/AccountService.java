package com.wayledger.account;

import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import java.util.List;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Users: sign-in look-up, creation with a hashed password, and role changes. */
@Service
public class AccountService implements UserDetailsService {

  private final AppUserRepository users;
  private final PasswordEncoder passwordEncoder;

  public AccountService(AppUserRepository users, PasswordEncoder passwordEncoder) {
    this.users = users;
    this.passwordEncoder = passwordEncoder;
  }

  @Override
  @Transactional(readOnly = true)
  public UserDetails loadUserByUsername(String username) {
    AppUser user =
        users
            .findByUsernameIgnoreCase(username)
            .orElseThrow(() -> new UsernameNotFoundException("No such user"));
    return User.withUsername(user.getUsername())
        .password(user.getPasswordHash())
        .roles(user.getRole().name())
        .disabled(!user.isEnabled())
        .build();
  }

  @Transactional(readOnly = true)
  public List<AppUser> all() {
    return users.findAllByOrderByUsernameAsc();
  }

  @Transactional(readOnly = true)
  public boolean anyUser() {
    return users.count() > 0;
  }

  @Transactional
  public AppUser create(UserForm form) {
    if (users.existsByUsernameIgnoreCase(form.username().strip())) {
      throw new RuleViolation("username", "user.username.taken");
    }
    PasswordPolicy.check(form.username(), form.password());
    AppUser user =
        new AppUser(
            form.username().strip(),
            passwordEncoder.encode(form.password()),
            form.displayName().strip(),
            form.role());
    return users.save(user);
  }

  @Transactional
  public void changeRole(long userId, Role role) {
    AppUser user = users.findById(userId).orElseThrow(() -> new NotFoundException("User", userId));
    if (user.getRole() == Role.ADMIN
        && role != Role.ADMIN
        && users.countByRoleAndEnabledTrue(Role.ADMIN) <= 1) {
      throw new RuleViolation("role", "user.role.lastAdmin");
    }
    user.changeRole(role);
  }
}
