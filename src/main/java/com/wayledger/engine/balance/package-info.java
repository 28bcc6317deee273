/**
 * Phase balancing of a three-phase board: which line each movable single-phase circuit should sit
 * on to minimise the largest phase current, proved optimal by a complete branch-and-bound search,
 * and the fewest circuit moves that fix an existing board. It also turns an arrangement into a
 * plain-words list of moves between ways, leaving locked and multi-pole circuits where they are.
 */
package com.wayledger.engine.balance;
