/**
 * Rule sets: the body of rules a site's circuits and boards are checked against (IEC 60364 / BS
 * 7671, the NEC), each data plus engine code behind one interface, so another can be added beside
 * them without touching either.
 */
package com.wayledger.engine.rules;
