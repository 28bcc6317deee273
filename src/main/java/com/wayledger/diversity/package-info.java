/**
 * Diversity methods as people manage them: the built-in methods to read, and user-defined copies
 * whose factors can be edited and stored. The methods themselves are plain data of the pure engine
 * (engine.demand).
 */
package com.wayledger.diversity;
