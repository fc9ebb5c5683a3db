module gaskit.example/cgo

go 1.19
