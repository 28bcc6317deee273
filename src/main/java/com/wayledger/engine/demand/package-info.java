/**
 * The demand engine: connected load, diversity methods held as data, per-phase complex sums,
 * neutral current, unbalance and incomer loading, carried from sub-boards up to the origin. It owns
 * the {@link com.wayledger.engine.demand.DemandEngine} entry points and the result records they
 * return.
 */
package com.wayledger.engine.demand;
