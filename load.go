package sagspan

import (
	_ "embed"
	"fmt"
	"io"
	"os"
)

//go:embed testdata/demo.json
var demoJSON []byte

// Demo returns the built-in demo bridge: an invented footbridge at an
// invented site, for trying the library. Its numbers are invented too.
func Demo() Bridge {
	b, err := Parse(demoJSON)
	if err != nil {
		panic("sagspan: the built-in demo bridge does not load: " + err.Error())
	}
	return b
}

// DemoJSON returns the JSON text of the built-in demo bridge, a starting
// point for a description of one's own.
func DemoJSON() []byte { return append([]byte(nil), demoJSON...) }

// Parse reads a bridge description from JSON and validates it. Every
// error is a *FieldError naming the offending field by its path and its
// line and column in data: syntax errors, unknown or repeated fields,
// missing required fields, type errors, quantities without their unit where
// a bare number is ambiguous, and every value Validate refuses.
func Parse(data []byte) (Bridge, error) {
	var b Bridge
	at, err := decodeStrict(data, &b)
	if err != nil {
		return Bridge{}, err
	}
	if err := b.Validate(); err != nil {
		locate(err, data, at)
		return Bridge{}, err
	}
	return b, nil
}

// Load reads and validates a bridge description from r.
func Load(r io.Reader) (Bridge, error) {
	data, err := io.ReadAll(r)
	if err != nil {
		return Bridge{}, fmt.Errorf("sagspan: reading bridge description: %w", err)
	}
	return Parse(data)
}

// LoadFile reads and validates the bridge description in the named file.
func LoadFile(name string) (Bridge, error) {
	data, err := os.ReadFile(name)
	if err != nil {
		return Bridge{}, fmt.Errorf("sagspan: %w", err)
	}
	b, err := Parse(data)
	if err != nil {
		return Bridge{}, fmt.Errorf("%s: %w", name, err)
	}
	return b, nil
}
