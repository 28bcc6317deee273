/**
 * Phase balancing of a stored board: builds the balancing problem from the board and its demand,
 * shows the proved-optimal and fewest-moves plans with their effect, and applies a chosen plan (or
 * undoes it) in one transaction. The search itself is the pure engine in
 * com.wayledger.engine.balance.
 */
package com.wayledger.balance;
