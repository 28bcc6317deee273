/**
 * The NEC (NFPA 70) tables and checks of the North American rule set: conductor sizes, Table 310.16
 * ampacities with their corrections, standard overcurrent device ratings and the branch-circuit and
 * feeder rules. Pure Java; every value says where it comes from (docs/calculations/nec.md).
 */
package com.wayledger.engine.nec;
