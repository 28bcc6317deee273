/**
 * Protection and cable checks as people see them: findings per site and per circuit, the device
 * proposal that passes every check at once, and the time–current chart of a circuit's device. The
 * checks themselves are in the pure engine (com.wayledger.engine.protection); this feature only
 * shows and applies their results.
 */
package com.wayledger.check;
