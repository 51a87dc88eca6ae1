package cable_test

import (
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

var (
	sinkForce units.Force
	sinkErr   error
)

func BenchmarkParabola(b *testing.B) {
	b.ReportAllocs()
	sp := cable.Span{Length: 100, Rise: 10}
	for i := 0; i < b.N; i++ {
		p, err := cable.NewParabola(sp, 2000, 8)
		_, tb := p.SupportTensions()
		sinkForce, sinkErr = tb, err
	}
}

func BenchmarkCatenarySag(b *testing.B) {
	b.ReportAllocs()
	sp := cable.Span{Length: 100, Rise: 10}
	for i := 0; i < b.N; i++ {
		c, err := cable.NewCatenary(sp, 1000, 12)
		sinkForce, sinkErr = c.Horizontal(), err
	}
}

func BenchmarkCatenaryLength(b *testing.B) {
	b.ReportAllocs()
	sp := cable.Span{Length: 100, Rise: 10}
	for i := 0; i < b.N; i++ {
		c, err := cable.CatenaryWithLength(sp, 1000, 104)
		sinkForce, sinkErr = c.Horizontal(), err
	}
}

func BenchmarkElasticCatenary(b *testing.B) {
	sp, rope, _ := ssnl114()
	cases := []struct {
		name string
		sp   cable.Span
		rope cable.ElasticRope
	}{
		{"taut-SSNL114", sp, rope},
		{"slack-inclined", cable.Span{Length: 100, Rise: 10}, cable.ElasticRope{Unstretched: 104, EA: 50e6, Weight: 1000}},
	}
	for _, c := range cases {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				e, err := cable.NewElasticCatenary(c.sp, c.rope)
				sinkForce, sinkErr = e.Horizontal(), err
			}
		})
	}
}

func BenchmarkChangeOfState(b *testing.B) {
	sp := cable.Span{Length: 80, Rise: 6}
	e := cable.Elastic{EA: 36.8e6, Alpha: 12e-6}
	from := cable.State{Load: cable.Load{Uniform: 1200}, H: 150e3, Temperature: units.FromCelsius(20)}
	cases := []struct {
		name string
		to   cable.Load
	}{
		{"uniform", cable.Load{Uniform: 5200}},
		{"half-span", cable.Load{Uniform: 1200, Patches: []cable.Patch{{From: 0, To: 40, Load: 4000}}}},
	}
	for _, c := range cases {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				s, err := cable.ChangeOfState(sp, e, from, c.to, units.FromCelsius(-10))
				sinkForce, sinkErr = s.H, err
			}
		})
	}
}

func BenchmarkChangeOfStateCubic(b *testing.B) {
	b.ReportAllocs()
	sp := cable.Span{Length: 80}
	e := cable.Elastic{EA: 36.8e6, Alpha: 12e-6}
	from := cable.State{Load: cable.Load{Uniform: 1200}, H: 150e3, Temperature: units.FromCelsius(20)}
	for i := 0; i < b.N; i++ {
		s, err := cable.ChangeOfStateCubic(sp, e, from, 5200, units.FromCelsius(-10))
		sinkForce, sinkErr = s.H, err
	}
}

func BenchmarkElasticChangeOfState(b *testing.B) {
	b.ReportAllocs()
	sp, rope, alpha := ssnl114()
	t0 := units.FromCelsius(0)
	for i := 0; i < b.N; i++ {
		e, err := cable.ElasticChangeOfState(sp, rope, alpha, t0, t0+39.26, rope.Weight)
		sinkForce, sinkErr = e.Horizontal(), err
	}
}

func BenchmarkFrequencies(b *testing.B) {
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		m, err := cable.Frequencies(cable.Span{Length: 100}, 245.25e3, 100, 1e9)
		sinkForce, sinkErr = units.Force(m.Symmetric), err
	}
}
