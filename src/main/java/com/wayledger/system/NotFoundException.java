package com.wayledger.system;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/** A site, board, circuit, load or user that does not exist (or no longer does). */
@ResponseStatus(HttpStatus.NOT_FOUND)
public class NotFoundException extends RuntimeException {

  public NotFoundException(String what, Object id) {
    super(what + " " + id + " not found");
  }
}
