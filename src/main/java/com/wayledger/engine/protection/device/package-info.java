/**
 * Characteristics of protective devices from their product standards: IEC 60898-1 breakers (MCBs,
 * and RCBOs' overcurrent part), IEC 60947-2 moulded-case breakers with their settings, IEC
 * 61008/61009 residual-current trip times, and the time–current bands drawn from them. Fuses have
 * no characteristic here.
 */
package com.wayledger.engine.protection.device;
