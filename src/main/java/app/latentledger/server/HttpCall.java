package app.latentledger.server;

import java.util.Map;

/**
 * One request as the routes see it, read whole before routing (bodies are bounded), so the API is
 * plain Java and the HTTP library stays in {@link OfficeServer}.
 *
 * @param method     GET, POST, PUT, ...
 * @param path       the decoded path, no query
 * @param query      query parameters (first value of each)
 * @param headers    request headers by lower-case name
 * @param body       the request body (empty when none)
 * @param clientAddr the client's address (from {@code X-Forwarded-For} only when configured)
 */
public record HttpCall(String method, String path, Map<String, String> query, Map<String, String> headers,
                       byte[] body, String clientAddr) {

    public String header(String name) {
        return headers.get(name.toLowerCase(java.util.Locale.ROOT));
    }
}
