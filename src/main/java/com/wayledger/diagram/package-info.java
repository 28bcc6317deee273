/**
 * The single-line diagram of a site: the supply, every board with its incomer, busbar, per-line
 * loading and worst finding, and every submain, laid out by tree depth in plain Java and drawn by
 * the server as SVG (on a page, as a download, and as a PNG in the site workbook).
 */
package com.wayledger.diagram;
