package app.latentledger.server;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;

import java.sql.Connection;
import java.sql.SQLException;

/**
 * The office database: a pool of PostgreSQL connections and the schema's versioned migrations
 * (Flyway, files in {@code app/latentledger/server/db}; separate from the tablet's SQLite ones).
 * Several instances may start at once: Flyway takes a database lock while it migrates.
 */
public final class OfficeDatabase implements AutoCloseable {
    static final String MIGRATIONS = "classpath:app/latentledger/server/db";

    private final HikariDataSource pool;
    private final Flyway flyway;

    private OfficeDatabase(HikariDataSource pool, Flyway flyway) {
        this.pool = pool;
        this.flyway = flyway;
    }

    /**
     * Opens the pool and brings the schema up to date.
     *
     * @param schema the PostgreSQL schema to use, or null for the role's default ({@code public});
     *               tests give each class its own
     */
    public static OfficeDatabase open(ServerConfig config, String schema) {
        HikariConfig h = new HikariConfig();
        h.setJdbcUrl(config.databaseUrl());
        if (config.databaseUser() != null) {
            h.setUsername(config.databaseUser());
        }
        if (config.databasePassword() != null) {
            h.setPassword(config.databasePassword());
        }
        h.setMaximumPoolSize(config.poolSize());
        h.setPoolName("office");
        h.setAutoCommit(true);
        h.setConnectionTimeout(10_000);
        // a server started before its database answers still starts; /ready says 503 until it does
        h.setInitializationFailTimeout(-1);
        Flyway flyway;
        HikariDataSource pool;
        if (schema != null) {
            h.setSchema(schema);
        }
        pool = new HikariDataSource(h);
        var fc = Flyway.configure().dataSource(pool).locations(MIGRATIONS).loggers("slf4j");
        if (schema != null) {
            fc = fc.schemas(schema).createSchemas(true);
        }
        flyway = fc.load();
        OfficeDatabase db = new OfficeDatabase(pool, flyway);
        try {
            flyway.migrate();
        } catch (RuntimeException e) {
            db.close();
            throw new ConfigException("the database could not be prepared (" + config.databaseShown() + "): "
                    + rootMessage(e));
        }
        return db;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        return t.getMessage() == null ? t.getClass().getSimpleName() : t.getMessage();
    }

    public Connection connection() throws SQLException {
        return pool.getConnection();
    }

    /** True when the database answers and no migration is pending (the readiness check). */
    public boolean ready() {
        try (Connection c = pool.getConnection()) {
            if (!c.isValid(2)) {
                return false;
            }
            return flyway.info().pending().length == 0;
        } catch (SQLException | RuntimeException e) {
            return false;
        }
    }

    @Override
    public void close() {
        pool.close();
    }
}
