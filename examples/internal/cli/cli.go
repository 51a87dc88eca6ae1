// Package cli holds what the example programs share: flags that may come
// before or after the description file, -h that exits 0, and loading the
// description (the built-in demo when no file is given).
package cli

import (
	"errors"
	"flag"
	"fmt"
	"io"

	"github.com/sagspan/sagspan"
)

// Parse parses args with fs, flags before, between or after the
// positional arguments, which it returns. With -h or -help it writes the
// usage to stdout and returns flag.ErrHelp (exit 0); on a bad flag the
// flag package has written the error, and Parse writes the usage to
// stderr.
func Parse(fs *flag.FlagSet, args []string, usage string, stdout, stderr io.Writer) ([]string, error) {
	fs.SetOutput(stderr)
	printUsage := func(w io.Writer) {
		fmt.Fprint(w, usage)
		fs.SetOutput(w)
		fs.PrintDefaults()
		fs.SetOutput(stderr)
	}
	fs.Usage = func() {}
	var positional []string
	rest := args
	for {
		if err := fs.Parse(rest); err != nil {
			if errors.Is(err, flag.ErrHelp) {
				printUsage(stdout)
			} else {
				printUsage(stderr)
			}
			return nil, err
		}
		if fs.NArg() == 0 {
			return positional, nil
		}
		positional = append(positional, fs.Arg(0))
		rest = fs.Args()[1:]
	}
}

// Load returns the bridge the positional arguments name: the description
// file given, or the built-in demo when there is none, and its source for
// the report.
func Load(positional []string) (sagspan.Bridge, string, error) {
	switch len(positional) {
	case 0:
		return sagspan.Demo(), "the built-in demo", nil
	case 1:
		b, err := sagspan.LoadFile(positional[0])
		return b, positional[0], err
	}
	return sagspan.Bridge{}, "", fmt.Errorf("give one bridge description file, not %d: %q", len(positional), positional)
}
