/**
 * The workspace database: the only package that speaks SQL. SQLite in WAL mode shared by several
 * processes; schema migrations; imports as one transaction; the append-only decision ledger; the
 * reads that scoring needs, as sorted columns. Depends on core only.
 */
package org.plenum.store;
