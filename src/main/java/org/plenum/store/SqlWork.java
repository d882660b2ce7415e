package org.plenum.store;

import java.sql.Connection;
import java.sql.SQLException;

/** Work done inside one transaction of the store. */
@FunctionalInterface
interface SqlWork<T> {
    T run(Connection connection) throws SQLException;
}
