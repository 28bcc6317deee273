package com.wayledger.account;

import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;

/** A person who signs in. The password is stored only as a hash. */
@Entity
@Table(name = "app_user")
public class AppUser {

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  private String username;
  private String passwordHash;
  private String displayName;

  @Enumerated(EnumType.STRING)
  private Role role;

  private boolean enabled = true;
  private Instant createdAt = Instant.now();

  protected AppUser() {}

  public AppUser(String username, String passwordHash, String displayName, Role role) {
    this.username = username;
    this.passwordHash = passwordHash;
    this.displayName = displayName;
    this.role = role;
  }

  void changeRole(Role newRole) {
    role = newRole;
  }

  void setEnabled(boolean enabled) {
    this.enabled = enabled;
  }

  public Long getId() {
    return id;
  }

  public String getUsername() {
    return username;
  }

  public String getPasswordHash() {
    return passwordHash;
  }

  public String getDisplayName() {
    return displayName;
  }

  public Role getRole() {
    return role;
  }

  public boolean isEnabled() {
    return enabled;
  }

  public Instant getCreatedAt() {
    return createdAt;
  }
}
