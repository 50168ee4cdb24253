package app.latentledger.server;

import java.sql.Connection;
import java.sql.SQLException;

/** One unit of database work in one transaction. */
final class Sql {
    private Sql() {
    }

    @FunctionalInterface
    interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    /**
     * Runs the work in one transaction and commits before returning, so a reply is sent only for a
     * write that is durable (PostgreSQL's default {@code synchronous_commit=on}).
     */
    static <T> T inTransaction(OfficeDatabase db, Work<T> work) {
        try (Connection c = db.connection()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(c);
                c.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            }
        } catch (SQLException e) {
            throw new IllegalStateException("database: " + e.getMessage(), e);
        }
    }
}
