/**
 * Sites: one installation with one supply origin, its address and supply characteristics. Owns the
 * site list and the site's create and edit forms; the board tree shown on a site's page belongs to
 * the board feature.
 */
package com.wayledger.site;
