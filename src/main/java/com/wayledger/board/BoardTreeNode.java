package com.wayledger.board;

/**
 * A board in a site's tree, with how many levels below the origin it sits (0 = fed from the
 * origin).
 */
public record BoardTreeNode(Board board, int depth) {}
