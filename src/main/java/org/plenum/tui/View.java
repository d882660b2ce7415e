package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import java.util.List;

/** One screen's body: it draws itself and answers the keys it knows. */
interface View {
    /** The view's name on the top line. */
    String name();

    void draw(Painter body);

    /** True when the view used the key; false leaves it to the keys every screen shares. */
    boolean handle(KeyStroke key);

    /** The keys that work here, shortest first, for the bottom line. */
    String hints();

    /** Each key of this view with what it does, for the help overlay. */
    List<String[]> help();

    /** Whether leaving now would drop typed input (quitting then asks first). */
    default boolean holdsInput() {
        return false;
    }

    /** Called when the meeting's shared state has been read again. */
    default void refreshed() {}
}
