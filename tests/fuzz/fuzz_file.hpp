// Helper of the file-reader fuzz targets: the fuzz bytes as a file the readers can open by name,
// without touching the disk (an anonymous memory file, /proc/self/fd/N).
#ifndef PUMPLOSS_FUZZ_FILE_HPP
#define PUMPLOSS_FUZZ_FILE_HPP

#include <sys/mman.h>
#include <unistd.h>

#include <cstdint>
#include <cstdlib>
#include <string>

namespace plfuzz {

class memory_file {
 public:
  memory_file(const std::uint8_t* data, std::size_t size) : fd_(memfd_create("pumploss-fuzz", 0)) {
    if (fd_ < 0) std::abort();
    std::size_t done = 0;
    while (done < size) {
      const ssize_t w = write(fd_, data + done, size - done);
      if (w <= 0) std::abort();
      done += static_cast<std::size_t>(w);
    }
    path_ = "/proc/self/fd/" + std::to_string(fd_);
  }
  ~memory_file() { close(fd_); }
  memory_file(const memory_file&) = delete;
  memory_file& operator=(const memory_file&) = delete;
  const std::string& path() const { return path_; }

 private:
  int fd_;
  std::string path_;
};

}  // namespace plfuzz

#endif
