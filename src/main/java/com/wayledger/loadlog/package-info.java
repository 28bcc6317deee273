/**
 * The load log: an append-only record of every change to sites, boards, circuits and loads (who,
 * when, why, before and after), the history pages and chart rebuilt from it, the "can it take it?"
 * advisor and the headroom overview. It listens to the other features' change events and depends on
 * them, never the reverse.
 */
package com.wayledger.loadlog;
