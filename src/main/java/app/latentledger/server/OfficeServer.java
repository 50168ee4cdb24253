package app.latentledger.server;

import org.eclipse.jetty.http.HttpField;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.io.Content;
import org.eclipse.jetty.server.ForwardedRequestCustomizer;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.SecureRequestCustomizer;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.server.SslConnectionFactory;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.Fields;
import org.eclipse.jetty.util.ssl.SslContextFactory;
import org.eclipse.jetty.util.thread.QueuedThreadPool;

import java.io.InputStream;
import java.io.PrintStream;
import java.nio.ByteBuffer;
import java.time.Instant;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The HTTP side of one server instance (Jetty 12's core handler API, no servlets): reads each request
 * whole (bounded), hands it to {@link Routes}, writes the reply and one access-log line. Holds no
 * session state: any instance can answer any request.
 */
public final class OfficeServer implements AutoCloseable {
    /** The largest request body read: a push of 500 records; a samples chunk is limited further by its route. */
    static final int MAX_BODY = 16 << 20;

    private final Server jetty;
    private final ServerConnector connector;
    private final OfficeDatabase db;

    private OfficeServer(Server jetty, ServerConnector connector, OfficeDatabase db) {
        this.jetty = jetty;
        this.connector = connector;
        this.db = db;
    }

    /** Opens the database (migrating it) and starts listening. */
    public static OfficeServer start(ServerConfig config, String schema, PrintStream accessLog) throws Exception {
        OfficeDatabase db = OfficeDatabase.open(config, schema);
        try {
            return startOn(config, db, accessLog);
        } catch (Exception e) {
            db.close();
            throw e;
        }
    }

    static OfficeServer startOn(ServerConfig config, OfficeDatabase db, PrintStream accessLog) throws Exception {
        Routes routes = new Routes(db, config);
        AccessLog log = new AccessLog(accessLog);
        QueuedThreadPool threads = new QueuedThreadPool(200, 8);
        threads.setName("office-http");
        Server jetty = new Server(threads);
        HttpConfiguration http = new HttpConfiguration();
        http.setSendServerVersion(false);
        if (config.trustForwardedFor()) {
            http.addCustomizer(new ForwardedRequestCustomizer());
        }
        ServerConnector connector;
        if (config.keystore() != null) {
            SslContextFactory.Server tls = new SslContextFactory.Server();
            tls.setKeyStorePath(config.keystore().toString());
            tls.setKeyStorePassword(config.keystorePassword());
            tls.setIncludeProtocols("TLSv1.3", "TLSv1.2");
            http.addCustomizer(new SecureRequestCustomizer());
            connector = new ServerConnector(jetty, new SslConnectionFactory(tls, "http/1.1"),
                    new HttpConnectionFactory(http));
        } else {
            connector = new ServerConnector(jetty, new HttpConnectionFactory(http));
        }
        connector.setHost(config.listenHost());
        connector.setPort(config.listenPort());
        jetty.addConnector(connector);
        jetty.setHandler(new Handler.Abstract() {
            @Override
            public boolean handle(Request request, Response response, Callback callback) {
                long t0 = System.nanoTime();
                String method = request.getMethod();
                String path = request.getHttpURI().getDecodedPath();
                String client = Request.getRemoteAddr(request);
                String[] device = new String[1];
                Reply reply;
                try {
                    HttpCall call = read(request, method, path, client);
                    reply = routes.handle(call, d -> device[0] = d);
                } catch (ApiError e) {
                    reply = e.reply();
                }
                response.setStatus(reply.status());
                reply.headers().forEach((k, v) -> response.getHeaders().put(k, v));
                response.getHeaders().put(HttpHeader.CONTENT_LENGTH, reply.body().length);
                int status = reply.status();
                response.write(true, ByteBuffer.wrap(reply.body()), Callback.from(() -> {
                    log.log(Instant.now(), method, path, status, (System.nanoTime() - t0) / 1e6, client, device[0]);
                    callback.succeeded();
                }, x -> {
                    log.log(Instant.now(), method, path, status, (System.nanoTime() - t0) / 1e6, client, device[0]);
                    callback.failed(x);
                }));
                return true;
            }
        });
        jetty.setStopTimeout(5_000);
        jetty.start();
        return new OfficeServer(jetty, connector, db);
    }

    private static HttpCall read(Request request, String method, String path, String client) {
        Map<String, String> headers = new HashMap<>();
        for (HttpField f : request.getHeaders()) {
            headers.putIfAbsent(f.getLowerCaseName(), f.getValue());
        }
        Map<String, String> query = new HashMap<>();
        try {
            Fields fields = Request.extractQueryParameters(request);
            for (Fields.Field f : fields) {
                query.putIfAbsent(f.getName(), f.getValue());
            }
        } catch (RuntimeException e) {
            throw ApiError.badInput("query", request.getHttpURI().getQuery(), "name=value pairs, URL-encoded",
                    "the query string cannot be read");
        }
        long declared = request.getLength();
        if (declared > MAX_BODY) {
            throw new ApiError(413, "too-large", "the request body has " + declared + " bytes; at most " + MAX_BODY
                    + " are accepted (split the push)");
        }
        byte[] body;
        try (InputStream in = Content.Source.asInputStream(request)) {
            body = in.readNBytes(MAX_BODY + 1);
        } catch (java.io.IOException e) {
            throw ApiError.badInput("body", "", "a complete request body", "the request body could not be read: "
                    + e.getMessage());
        }
        if (body.length > MAX_BODY) {
            throw new ApiError(413, "too-large", "the request body has more than " + MAX_BODY + " bytes (split the push)");
        }
        return new HttpCall(method.toUpperCase(Locale.ROOT), path, query, headers, body, client);
    }

    /** The port listened on (the real one when 0 was asked for). */
    public int port() {
        return connector.getLocalPort();
    }

    public OfficeDatabase database() {
        return db;
    }

    /** Blocks until the server stops. */
    public void join() throws InterruptedException {
        jetty.join();
    }

    @Override
    public void close() {
        try {
            jetty.stop();
        } catch (Exception e) {
            throw new IllegalStateException("the server did not stop cleanly: " + e.getMessage(), e);
        } finally {
            db.close();
        }
    }
}
