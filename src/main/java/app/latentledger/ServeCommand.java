package app.latentledger;

import app.latentledger.cli.Args;
import app.latentledger.cli.CliContext;
import app.latentledger.cli.Command;
import app.latentledger.cli.UsageException;
import app.latentledger.server.ConfigException;
import app.latentledger.server.ServeLauncher;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * {@code serve}: the office server (see docs/office-server.md). It lives beside {@link Main}, the one
 * place that knows the faces: the command line never imports the server and the server never the
 * command line; this class only hands the parsed words over.
 */
public final class ServeCommand implements Command {
    @Override
    public String name() {
        return "serve";
    }

    @Override
    public String summary() {
        return "run the office server on PostgreSQL (tablets sync to it); admin steps";
    }

    @Override
    public String usage() {
        return ServeLauncher.usage();
    }

    @Override
    public int run(Args args, CliContext context) throws Exception {
        Map<String, String> options = new LinkedHashMap<>();
        for (String name : ServeLauncher.optionNames()) {
            String v = args.value(name);
            if (v != null) {
                options.put(name, v);
            }
        }
        args.rejectUnknown();
        try {
            return ServeLauncher.run(args.positionals(), options, System.getenv(), context.out(), context.err());
        } catch (ConfigException e) {
            throw new UsageException(e.getMessage());
        } finally {
            context.out().flush();
        }
    }
}
