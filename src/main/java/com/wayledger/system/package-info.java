/**
 * What every feature shares and none owns: the rule-violation and not-found exceptions, page error
 * handling, the start-up banner and the web configuration. It depends on no feature, so any feature
 * may use it.
 */
package com.wayledger.system;
