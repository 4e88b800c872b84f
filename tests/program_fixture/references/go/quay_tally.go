package main

import (
	"bufio"
	"fmt"
	"os"
	"strconv"
)

func main() {
	scanner := bufio.NewScanner(os.Stdin)
	scanner.Split(bufio.ScanWords)
	scanner.Scan()
	n, _ := strconv.Atoi(scanner.Text())
	var total, heaviest int64
	for i := 0; i < n; i++ {
		scanner.Scan()
		w, _ := strconv.ParseInt(scanner.Text(), 10, 64)
		total += w
		if w > heaviest {
			heaviest = w
		}
	}
	fmt.Println(total, heaviest)
}
