/**
 * The fault path down a site's board tree: Ze and prospective fault current at each board, voltage
 * drop from the origin, and each circuit's earth fault loop impedance Zs. Measured values recorded
 * on the schedule override calculated ones, and every figure says which it is.
 */
package com.wayledger.engine.protection.fault;
