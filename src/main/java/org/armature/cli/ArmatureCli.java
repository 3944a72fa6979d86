package org.armature.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.function.Supplier;
import org.armature.io.StageFileException;
import picocli.CommandLine;

/**
 * Entry point of the headless command line ({@code armature COMMAND ...}), built on picocli.
 *
 * <p>Exit status: 0 success, 1 failure ({@link CommandFailedException}, {@link StageFileException},
 * solver failures, any other exception of a command), 2 usage error (unknown option, bad number,
 * unknown template, option not applicable). Every error is one sentence on the error stream, never a
 * stack trace: usage errors go through one handler ({@code usageError}), every other failure through
 * one other ({@link #failureSentence(Throwable)}), so a new command needs no error handling of its own.
 *
 * <p><b>Adding a subcommand:</b> write one class per subcommand in this package, annotated
 * {@code @Command(name = "...")} and implementing {@code Callable<Integer>}; write results through
 * {@code spec.commandLine().getOut()}, throw {@link CommandFailedException} for failures and
 * {@link CommandLine.ParameterException} for usage errors; then add its constructor (or a factory
 * returning a {@link CommandLine}) to {@link #SUBCOMMANDS}. Nothing else needs changing.
 *
 * <p>Nothing here loads a JavaFX class.
 */
public final class ArmatureCli {

    /** Longest part of an engine's own message repeated in a failure sentence. */
    private static final int MAX_DETAIL_CHARS = 300;

    /** What {@code armature --version} prints. */
    public static final String VERSION = "armature 0.1.0";

    /**
     * Every subcommand, in the order {@code --help} lists them. Each supplier returns a fresh command:
     * an instance of a {@code @Command} class, or a {@link CommandLine} for commands that add options
     * programmatically.
     */
    static final List<Supplier<Object>> SUBCOMMANDS = List.of(
            NewCommand::commandLine,
            SolveCommand::new,
            SimulateCommand::new,
            CheckCommand::new,
            SizeCommand::new,
            ExportCommand::new,
            FaultsCommand::new,
            DiagnoseCommand::new,
            CompareCommand::new);

    private ArmatureCli() {
    }

    /**
     * Runs the command line on the process's standard streams.
     *
     * @param args the arguments after the program name
     * @return the exit status
     */
    public static int run(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        return run(args, out, err);
    }

    /**
     * Runs the command line with the given streams (tests capture them).
     *
     * @return the exit status: 0, 1 (failure) or 2 (usage error)
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        int status;
        try {
            status = commandLine(out, err).execute(args);
        } catch (OutOfMemoryError | StackOverflowError e) {
            // picocli hands only Exceptions to the handler; these two still get one sentence
            err.println("armature: " + failureSentence(e));
            status = CommandLine.ExitCode.SOFTWARE;
        }
        out.flush();
        err.flush();
        return status;
    }

    /** The configured command line with all subcommands, writing to the given streams. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new ArmatureCommand());
        for (Supplier<Object> sub : SUBCOMMANDS) {
            cl.addSubcommand(sub.get());
        }
        WholeNumbers.register(cl);
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler(ArmatureCli::usageError);
        cl.setExecutionExceptionHandler(ArmatureCli::failure);
        return cl;
    }

    /**
     * Tells the user that the window cannot be opened (the launcher calls this when started without
     * arguments and the window is not available).
     *
     * @param reason one sentence saying why
     * @return the exit status to use, 1
     */
    public static int windowUnavailable(String reason) {
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        err.println("armature: " + reason + " Run 'armature --help' for the command line.");
        err.flush();
        return CommandLine.ExitCode.SOFTWARE;
    }

    private static int usageError(CommandLine.ParameterException e, String[] args) {
        CommandLine cmd = e.getCommandLine();
        PrintWriter err = cmd.getErr();
        String command = cmd.getCommandSpec().qualifiedName();
        String what = e.getMessage();
        if (e instanceof CommandLine.UnmatchedArgumentException u && what.startsWith("Unmatched argument")
                && !u.getUnmatched().isEmpty()) {
            what = "'" + u.getUnmatched().get(0) + "' is not a command or argument of " + command;
        }
        err.println(command + ": " + sentence(what) + " (see '" + command + " --help')");
        err.flush();
        return CommandLine.ExitCode.USAGE;
    }

    private static int failure(Exception e, CommandLine cmd, CommandLine.ParseResult parsed) {
        PrintWriter err = cmd.getErr();
        err.println(cmd.getCommandSpec().qualifiedName() + ": " + failureSentence(e));
        err.flush();
        return CommandLine.ExitCode.SOFTWARE;
    }

    /**
     * The one sentence for any failure of a command. Our own failures carry their sentence; an
     * engine failure or an invariant of the document records says what stopped the command in the
     * exception's own words. Never a stack trace, never a request to report an "internal error":
     * the user is told what could not be done and what to look at.
     */
    static String failureSentence(Throwable e) {
        if (e instanceof CommandFailedException || e instanceof StageFileException) {
            return sentence(e.getMessage());
        }
        if (e instanceof java.io.UncheckedIOException u) {
            return sentence("A file could not be read or written: " + describe(u.getCause()));
        }
        if (e instanceof org.armature.solver.SolverException
                || e instanceof org.armature.solver.timedomain.TransientFailureException) {
            return sentence("The stage could not be solved: " + describe(e));
        }
        if (e instanceof OutOfMemoryError) {
            return "The command ran out of memory; give the Java runtime more (-Xmx) or a smaller input.";
        }
        if (e instanceof StackOverflowError) {
            return "The command's input nests too deeply to be processed.";
        }
        return sentence("The command stopped: " + describe(e));
    }

    private static String describe(Throwable e) {
        String m = e == null ? null : e.getMessage();
        if (m == null || m.isBlank()) {
            return "the calculation could not be completed with these values";
        }
        String firstLine = m.strip().lines().findFirst().orElse(m.strip());
        return firstLine.length() > MAX_DETAIL_CHARS ? firstLine.substring(0, MAX_DETAIL_CHARS) + "…" : firstLine;
    }

    /** A message as one sentence: one line, ending in a full stop. */
    static String sentence(String message) {
        String s = message == null ? "" : message.strip().replaceAll("\\s*\\R\\s*", " ");
        return s.endsWith(".") || s.endsWith("?") ? s : s + ".";
    }
}
