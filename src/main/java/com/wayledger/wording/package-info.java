/**
 * Which words a page is written in: the user's chosen interface language, else the rule set of the
 * site the page is about (en-US for the NEC set, en-GB for the IEC set), else the browser's choice
 * between the two. One locale resolver decides it for pages, fragments and exports alike.
 */
package com.wayledger.wording;
