/**
 * The invented demo scenario (a small mixed-use building) and the demo accounts, loaded once in the
 * demo profile only. Everything here is made up; it exists so that a new user sees a realistic site
 * at once.
 */
package com.wayledger.demo;
