package app.latentledger.cli;

import app.latentledger.store.Ledger;
import app.latentledger.sync.OfficeAccount;
import app.latentledger.sync.OfficeSync;
import app.latentledger.sync.SyncException;
import app.latentledger.sync.SyncReport;
import app.latentledger.sync.SyncState;
import app.latentledger.sync.SyncStatus;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * {@code office enrol|sync|status}: this tablet and the company's office server. Refused input,
 * a used code, no network or a removed tablet exit 2 with a sentence on standard error; what was
 * refused in a sync is listed and also exits 2; nothing local is lost either way.
 */
public final class OfficeCommand implements Command {
    @Override
    public String name() {
        return "office";
    }

    @Override
    public String summary() {
        return "sync with the office server: enrol this tablet, sync, or show what is waiting";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] office enrol --server URL --code CODE [--device-name NAME] [--json]\n"
                + "       latent-ledger [--data-dir DIR] office sync [--json]\n"
                + "       latent-ledger [--data-dir DIR] office status [--json]\n"
                + "  enrol: once per tablet, with a one-time code from the office (valid 24 h)\n"
                + "  sync:  sends what changed here, then fetches what changed at the office\n"
                + "  status: the office, the last sync, what is waiting to go and what was refused\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        boolean json = args.flag("json");
        String sub = words.size() == 1 ? words.get(0) : "";
        String server = args.value("server");
        String code = args.value("code");
        String deviceName = args.value("device-name");
        args.rejectUnknown();
        if (!sub.equals("enrol") && (server != null || code != null || deviceName != null)) {
            throw new UsageException("--server, --code and --device-name belong to 'office enrol'\n" + usage());
        }
        try (Ledger ledger = LedgerRecords.open(context)) {
            OfficeSync sync = new OfficeSync(ledger);
            switch (sub) {
                case "enrol" -> {
                    if (server == null || code == null) {
                        throw new UsageException("office enrol needs --server URL and --code CODE\n" + usage());
                    }
                    OfficeAccount a = sync.enrol(server, code, deviceName);
                    context.out().print(json ? Json.print(account(a)) + "\n"
                            : "Enrolled with " + a.company() + " at " + a.serverUrl() + " as " + a.deviceName()
                            + (a.technician().isEmpty() ? "" : " (technician " + a.technician() + ")")
                            + ". Run 'office sync' to send and fetch records.\n");
                    return Cli.OK;
                }
                case "sync" -> {
                    SyncReport r = sync.syncNow();
                    context.out().print(json ? Json.print(report(r)) + "\n" : r.summary() + "\n" + waiting(r.waiting()));
                    return r.refused().isEmpty() ? Cli.OK : Cli.REFUSED;
                }
                case "status" -> {
                    SyncStatus s = sync.status();
                    context.out().print(json ? Json.print(status(s)) + "\n" : statusText(s));
                    return Cli.OK;
                }
                default -> throw new UsageException("office needs enrol, sync or status\n" + usage());
            }
        } catch (SyncException e) {
            context.err().println("latent-ledger: " + e.getMessage());
            return Cli.REFUSED;
        }
    }

    private static String waiting(int n) {
        return n == 0 ? "Nothing is waiting to go.\n" : n + (n == 1 ? " record is" : " records are") + " waiting to go.\n";
    }

    private static String statusText(SyncStatus s) {
        StringBuilder b = new StringBuilder();
        if (s.account().isEmpty()) {
            b.append("Not enrolled with an office. Enrol with: office enrol --server URL --code CODE\n");
        } else {
            OfficeAccount a = s.account().get();
            b.append("Office:     ").append(a.company()).append(" at ").append(a.serverUrl()).append('\n');
            b.append("This tablet: ").append(a.deviceName()).append(a.technician().isEmpty() ? ""
                    : ", technician " + a.technician()).append(", enrolled ").append(Visits.when(a.enrolledAt()))
                    .append('\n');
        }
        if (s.lastSync().isPresent()) {
            SyncState.LastSync l = s.lastSync().get();
            b.append("Last sync:  ").append(Visits.when(l.at())).append(", ").append(outcome(l.outcome())).append(": ")
                    .append(l.message()).append('\n');
        } else if (s.account().isPresent()) {
            b.append("Last sync:  never\n");
        }
        b.append(waiting(s.waiting()));
        for (SyncReport.Refused r : s.refusals()) {
            b.append("Refused:    ").append(r.sentence()).append('\n');
        }
        return b.toString();
    }

    private static String outcome(String key) {
        return switch (key) {
            case "done" -> "done";
            case "refusals" -> "done with refusals";
            case "failed" -> "did not finish";
            default -> key;
        };
    }

    private static Map<String, Object> account(OfficeAccount a) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("server", a.serverUrl());
        m.put("company", a.company());
        m.put("technician", a.technician());
        m.put("role", a.role());
        m.put("deviceId", a.deviceId());
        m.put("deviceName", a.deviceName());
        m.put("enrolledAt", a.enrolledAt().toString());
        return m;
    }

    private static Map<String, Object> report(SyncReport r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("sent", r.sent());
        m.put("alreadyThere", r.alreadyThere());
        m.put("keptAside", r.keptAside());
        m.put("received", r.received());
        m.put("keptLocal", r.keptLocal());
        m.put("sampleBytes", r.sampleBytes());
        m.put("waiting", r.waiting());
        m.put("refused", refusals(r.refused()));
        return m;
    }

    private static Map<String, Object> status(SyncStatus s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("enrolled", s.account().isPresent());
        m.put("account", s.account().map(OfficeCommand::account).orElse(null));
        m.put("lastSync", s.lastSync().map(l -> {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("at", l.at().toString());
            x.put("outcome", l.outcome());
            x.put("message", l.message());
            return x;
        }).orElse(null));
        m.put("waiting", s.waiting());
        m.put("refused", refusals(s.refusals()));
        return m;
    }

    private static List<Map<String, Object>> refusals(List<SyncReport.Refused> refused) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (SyncReport.Refused r : refused) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("kind", r.kind().wire());
            x.put("id", r.id());
            x.put("field", r.refusal().field());
            x.put("value", r.refusal().value());
            x.put("range", r.refusal().range());
            x.put("message", r.refusal().message());
            out.add(x);
        }
        return out;
    }
}
