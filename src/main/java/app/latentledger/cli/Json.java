package app.latentledger.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;

/** JSON printing for {@code --json}: pretty, nulls kept (a null says "not computable"). */
final class Json {
    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().serializeNulls()
            .disableHtmlEscaping().create();

    private Json() {
    }

    static String print(Object value) {
        return GSON.toJson(value);
    }
}
