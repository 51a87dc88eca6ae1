package sagspan

import (
	"bytes"
	"encoding/json"
	"fmt"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// Level is an elevation that a description may declare absent, such as
// the design flood of a crossing no flood reaches. In JSON it is an
// elevation ("103.5 m") or the word "none"; leaving it out is an error, so
// that a forgotten level is never taken as 0 m.
type Level struct {
	// Z is the elevation; it means nothing when None is set.
	Z units.Length
	// None declares that there is no such level.
	None bool
}

// LevelAt returns the level at elevation z.
func LevelAt(z units.Length) Level { return Level{Z: z} }

// NoLevel returns the level declared absent ("none").
func NoLevel() Level { return Level{None: true} }

// String returns the elevation with its unit, or "none".
func (l Level) String() string {
	if l.None {
		return "none"
	}
	return l.Z.String()
}

// UnmarshalJSON reads an elevation (a bare SI number or a string with its
// unit) or "none".
func (l *Level) UnmarshalJSON(b []byte) error {
	var s string
	if b = bytes.TrimSpace(b); len(b) > 0 && b[0] == '"' && json.Unmarshal(b, &s) == nil &&
		strings.EqualFold(strings.TrimSpace(s), "none") {
		*l = NoLevel()
		return nil
	}
	var z units.Length
	if err := z.UnmarshalJSON(b); err != nil {
		return fmt.Errorf("%w; or \"none\" when there is no such level", err)
	}
	*l = LevelAt(z)
	return nil
}

// MarshalJSON writes the elevation in metres as a bare number, or "none".
func (l Level) MarshalJSON() ([]byte, error) {
	if l.None {
		return []byte(`"none"`), nil
	}
	return json.Marshal(float64(l.Z))
}
