package com.wayledger;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

/** Wayledger: distribution board schedules with demand, balancing and protection checks. */
@SpringBootApplication
public class WayledgerApplication {

  public static void main(String[] args) {
    SpringApplication.run(WayledgerApplication.class, args);
  }
}
