package org.tankwright.cli;

import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;
import org.tankwright.design.Problem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code tankwright validate FILE...}: checks design files and lists every problem in each. */
@Command(name = "validate", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Check design files and list every problem found, with its JSON path. Exit 0 when all are valid, 3 otherwise.")
public final class ValidateCommand implements Callable<Integer> {
    @Parameters(arity = "1..*", paramLabel = "FILE", description = "design files (.json)")
    List<Path> files;

    @Override
    public Integer call() {
        int status = ExitCodes.OK;
        for (Path f : files) {
            try {
                if (!Files.exists(f)) {
                    throw new NoSuchFileException(f.toString());
                }
                DesignFiles.load(f);
                System.out.println(f + ": valid");
            } catch (DesignException e) {
                status = ExitCodes.INVALID_INPUT;
                List<Problem> ps = e.problems();
                System.out.println(f + ": " + ps.size() + " problem" + (ps.size() == 1 ? "" : "s"));
                for (Problem p : ps) {
                    System.out.println("  " + p);
                }
            } catch (NoSuchFileException e) {
                status = ExitCodes.INVALID_INPUT;
                System.out.println(f + ": no such file");
            } catch (IOException e) {
                status = ExitCodes.INVALID_INPUT;
                System.out.println(f + ": cannot be read: " + e.getMessage());
            }
        }
        return status;
    }
}
