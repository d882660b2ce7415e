/**
 * Files in and out: strict CSV import with a message at the line and column of every problem, and
 * the ledger export. Depends on core and store.
 */
package org.plenum.io;
