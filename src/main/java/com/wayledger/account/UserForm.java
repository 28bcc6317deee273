package com.wayledger.account;

import com.wayledger.system.CleanText;
import com.wayledger.system.TextInput.Kind;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;

/** A new user as an admin types it. */
public record UserForm(
    @NotBlank @Size(min = 2, max = 60) @Pattern(regexp = "[A-Za-z0-9._@-]+") String username,
    @NotBlank @Size(max = 120) @CleanText(Kind.NAME) String displayName,
    @NotBlank @Size(min = 10, max = 200) String password,
    @NotNull Role role) {

  public static UserForm blank() {
    return new UserForm("", "", "", Role.VIEWER);
  }
}
