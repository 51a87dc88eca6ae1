package sagspan

import (
	"fmt"
	"syscall"
	"testing"
	"time"
)

func cpuNow() time.Duration {
	var ru syscall.Rusage
	syscall.Getrusage(syscall.RUSAGE_SELF, &ru)
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

func TestZZCPU(t *testing.T) {
	b := Demo()
	opts := &Options{SkipComfort: true}
	Check(b, opts)
	const n = 30
	c0, w0 := cpuNow(), time.Now()
	for range n {
		Check(b, opts)
	}
	fmt.Printf("CPU per Check (no comfort): %v, wall %v\n", (cpuNow()-c0)/n, time.Since(w0)/n)
}
