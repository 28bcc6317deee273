package com.wayledger.account;

import jakarta.validation.constraints.NotNull;

/** The interface language as the account page posts it, with the version the page was opened at. */
public record LanguageForm(@NotNull InterfaceLanguage language, @NotNull Long version) {}
