package com.wayledger.account;

/** What a user may do. Each role includes the ones before it. */
public enum Role {
  /** Reads sites, boards and results. */
  VIEWER,
  /** Also changes sites, boards, circuits and loads. */
  EDITOR,
  /** Also manages users. */
  ADMIN
}
