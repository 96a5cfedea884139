#pragma once
// While one of these is alive, memory freed at the top of the C heap stays with the process for
// reuse instead of going back to the system at each free. Writing a workbook frees and allocates
// again, part after part, a compression state of about 270 kB, and a row of cells per row; with
// the C library's default (give back anything over 128 kB at the top) each part faulted the same
// pages in again. Measured in docs/benchmarks.md, Export. glibc only; elsewhere it does nothing.
//
// Instances may nest and may live on several threads at once: the first sets the threshold and
// the last one to go puts back glibc's documented default (mallopt(3), M_TRIM_THRESHOLD: 128 kB),
// after which the next free at the top gives the memory back as before.

namespace mendwright::spreadsheet {

class HeapKeptForReuse {
public:
    HeapKeptForReuse();
    ~HeapKeptForReuse();
    HeapKeptForReuse(const HeapKeptForReuse&) = delete;
    HeapKeptForReuse& operator=(const HeapKeptForReuse&) = delete;
};

}  // namespace mendwright::spreadsheet
