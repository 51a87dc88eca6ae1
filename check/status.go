package check

import (
	"encoding/json"
	"fmt"
)

// Status is the verdict of a check. Programs should compare with the named
// values, not rely on their numeric order.
type Status int

// The verdicts, from least to most severe as Worse orders them.
const (
	// Info reports a value with no limit to meet.
	Info Status = iota
	// Pass means the demand is within the capacity.
	Pass
	// Flag is advisory: outside published guidance but not a failure,
	// such as a natural frequency in the range walkers excite.
	Flag
	// Fail means the demand exceeds the capacity.
	Fail
)

var statuses = [...]struct {
	name     string
	severity int
}{
	Info: {"info", 0},
	Pass: {"pass", 1},
	Flag: {"flag", 2},
	Fail: {"FAIL", 3},
}

func (s Status) valid() bool { return s >= 0 && int(s) < len(statuses) }

// String returns the status as printed in reports: "pass", "FAIL", "flag"
// or "info".
func (s Status) String() string {
	if !s.valid() {
		return fmt.Sprintf("Status(%d)", int(s))
	}
	return statuses[s].name
}

// Worse reports whether s is more severe than t.
func (s Status) Worse(t Status) bool { return s.severity() > t.severity() }

func (s Status) severity() int {
	if !s.valid() {
		return statuses[Fail].severity + 1
	}
	return statuses[s].severity
}

// MarshalJSON writes the status as its lower-case name.
func (s Status) MarshalJSON() ([]byte, error) {
	if !s.valid() {
		return nil, fmt.Errorf("check: invalid status %d", int(s))
	}
	return json.Marshal(lower(statuses[s].name))
}

// UnmarshalJSON reads a status written by MarshalJSON.
func (s *Status) UnmarshalJSON(b []byte) error {
	var name string
	if err := json.Unmarshal(b, &name); err != nil {
		return fmt.Errorf("check: status: %w", err)
	}
	for i, st := range statuses {
		if lower(st.name) == name {
			*s = Status(i)
			return nil
		}
	}
	return fmt.Errorf("check: unknown status %q", name)
}

func lower(s string) string {
	b := []byte(s)
	for i, c := range b {
		if 'A' <= c && c <= 'Z' {
			b[i] = c + 'a' - 'A'
		}
	}
	return string(b)
}
