/**
 * The protection and cable check engine: from a site's boards, circuits and their demand, it works
 * out fault levels, loop impedances, capacities and voltage drops and returns one finding per check
 * with its numbers and clause. It also proposes, for a circuit, the lowest-rated breaker that
 * passes every check at once.
 */
package com.wayledger.engine.protection;
