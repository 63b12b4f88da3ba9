package main

import "testing"

// TestPageURL: the address printed is one a browser opens; a server on
// every interface is opened at the loopback address and is said open.
func TestPageURL(t *testing.T) {
	for _, c := range []struct {
		addr, want string
		open       bool
	}{
		{"127.0.0.1:8080", "http://127.0.0.1:8080/", false},
		{"[::1]:8080", "http://[::1]:8080/", false},
		{"[::]:36347", "http://127.0.0.1:36347/", true},
		{"0.0.0.0:80", "http://127.0.0.1:80/", true},
	} {
		if got, open := pageURL(c.addr); got != c.want || open != c.open {
			t.Errorf("%s: %q %v, want %q %v", c.addr, got, open, c.want, c.open)
		}
	}
}
