package app.latentledger;

import app.latentledger.cli.Args;
import app.latentledger.cli.Cli;
import app.latentledger.cli.CliContext;
import app.latentledger.cli.Command;
import app.latentledger.cli.UsageException;
import app.latentledger.store.DataLocation;
import app.latentledger.ui.render.PngScreens;

import java.nio.file.Path;
import java.util.List;

/**
 * {@code screens --out DIR}: every main screen of the app as PNG, 1280 × 800 landscape and 800 × 1280
 * portrait, on the data folder's ledger (the demo when it is new). Needs a display (e.g.
 * {@code xvfb-run}).
 *
 * <p>It lives beside {@link Main}, the one place that knows both faces: the command line stays free
 * of JavaFX, the app never knows the command line, and the renderer is an ordinary call the
 * compiler checks. JavaFX is loaded only when the command runs.
 */
public final class ScreensCommand implements Command {
    @Override
    public String name() {
        return "screens";
    }

    @Override
    public String summary() {
        return "draw every app screen to PNG (landscape and portrait)";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] screens --out DIR\n"
                + "  Renders every main screen with the ledger's data (the Saltreed demo in a new data folder)\n"
                + "  to DIR/<screen>-landscape.png (1280x800) and DIR/<screen>-portrait.png (800x1280).\n"
                + "  Needs a display; on a server run it under xvfb-run.\n";
    }

    @Override
    public int run(Args args, CliContext context) throws Exception {
        String out = args.value("out");
        args.rejectUnknown();
        args.noPositionals();
        if (out == null || out.isBlank()) {
            throw new UsageException("screens needs --out DIR\n" + usage());
        }
        Path folder = DataLocation.resolve(context.dataDir()).folder();
        List<Path> files = new PngScreens().render(folder, Path.of(out));
        for (Path f : files) {
            context.out().println(f);
        }
        return Cli.OK;
    }
}
