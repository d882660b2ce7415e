/**
 * The invented demo scenario and its generator (fixed seed), with the forecast method its stat
 * step uses (Holt-Winters). Used only to build demo-data/; nothing else depends on it but the demo
 * command.
 */
package org.plenum.demo;
