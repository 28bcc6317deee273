/**
 * The vocabulary of protection results: findings with their verdict, named quantities and the
 * values that may be missing. Every other protection package speaks in these types, and this
 * package depends on none of them.
 */
package com.wayledger.engine.protection.result;
