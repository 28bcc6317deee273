package com.wayledger.system;

/**
 * Published inside the transaction that adds, edits or removes a user-defined diversity method: any
 * site's boards may use it, so every site's data generation moves on (see {@link SiteGenerations}).
 *
 * @param methodKey the method's key
 */
public record MethodsChanged(String methodKey) {}
