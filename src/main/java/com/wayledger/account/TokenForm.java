package com.wayledger.account;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

/** A new API token as its owner names it on the account page. */
public record TokenForm(@NotBlank @Size(max = 80) String name, @NotNull TokenScope scope) {

  public static TokenForm blank() {
    return new TokenForm("", TokenScope.READ);
  }
}
