/**
 * Boards and their schedules: ways, circuits, devices, cables and load items, the board tree of a
 * site, and the one mapper that turns stored boards into engine inputs. Rules such as "one circuit
 * per position" live in {@link com.wayledger.board.ScheduleService} and in the database constraints
 * behind it.
 */
package com.wayledger.board;
