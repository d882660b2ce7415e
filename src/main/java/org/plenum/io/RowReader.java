package org.plenum.io;

import java.util.List;
import org.plenum.store.ImportSession;

/** Turns checked records of one kind of file into rows and writes batches of them. */
interface RowReader<R> {
    /** The row of this record; also refuses a key seen earlier in the same file. */
    R read(Record record) throws FieldException;

    /** Writes a batch and returns the lines of rows whose key the workspace already held. */
    List<Integer> write(ImportSession session, List<R> rows);

    /** The column a key conflict is reported at. */
    String keyColumn();

    /** The words for the key, for the conflict message: "item, period". */
    String keyWords();
}
