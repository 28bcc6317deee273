package com.wayledger.account;

/** What an API token may do: at most read, or whatever its owner's role allows. */
public enum TokenScope {
  /** GET requests only, whatever the owner's role (the token acts as a viewer). */
  READ,
  /** Whatever the owner's role allows. */
  READ_WRITE
}
