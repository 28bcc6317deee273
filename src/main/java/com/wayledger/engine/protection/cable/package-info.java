/**
 * Cable figures for the protection checks: conductor resistance at operating temperature,
 * current-carrying capacity with its correction factors, and voltage drop per ampere per metre.
 * Copper only; aluminium and the installation methods without a shipped table are reported as
 * missing, never guessed.
 */
package com.wayledger.engine.protection.cable;
