/**
 * Spreadsheet exchange: board and site schedules out to XLSX (with live totals) and CSV,
 * spreadsheets back in through a column mapping and a row-by-row preview, and the printable door
 * chart. It reads and writes schedules only through the board feature's services and its one engine
 * mapper.
 */
package com.wayledger.exchange;
