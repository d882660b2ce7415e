package org.plenum.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.plenum.app.Tags;
import org.plenum.app.UsageException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "tags", mixinStandardHelpOptions = true,
        description = "List the workspace's event tags, or add one: plenum tags add NAME.")
final class TagsCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Parameters(arity = "0..2", paramLabel = "add NAME")
    java.util.List<String> words;

    @Override
    public Integer call() {
        PrintWriter out = root.spec.commandLine().getOut();
        if (words == null || words.isEmpty()) {
            Tags.list(root.workspaces, db.path).forEach(out::println);
            return ExitCodes.OK;
        }
        if (words.size() != 2 || !words.get(0).equals("add")) {
            throw new UsageException("tags: expected nothing or: add NAME");
        }
        boolean added = Tags.add(root.workspaces, db.path, words.get(1));
        out.println(added ? "added tag " + words.get(1) : "tag " + words.get(1) + " was already there");
        return ExitCodes.OK;
    }
}
