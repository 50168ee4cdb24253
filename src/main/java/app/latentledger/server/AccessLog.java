package app.latentledger.server;

import com.google.gson.JsonObject;

import java.io.PrintStream;
import java.time.Instant;

/**
 * One JSON line per request: time, method, path (never the query string: nothing secret travels
 * there, and nothing is logged that could be), status, milliseconds, client address and the device
 * id once the token was accepted. Tokens, codes and bodies are never logged.
 */
final class AccessLog {
    private final PrintStream out;

    AccessLog(PrintStream out) {
        this.out = out;
    }

    void log(Instant time, String method, String path, int status, double ms, String client, String device) {
        JsonObject o = new JsonObject();
        o.addProperty("time", time.toString());
        o.addProperty("method", method);
        o.addProperty("path", path);
        o.addProperty("status", status);
        o.addProperty("ms", Math.round(ms * 10) / 10.0);
        o.addProperty("client", client);
        o.addProperty("device", device);
        String line = Reply.GSON.toJson(o);
        synchronized (out) {
            out.println(line);
        }
    }
}
