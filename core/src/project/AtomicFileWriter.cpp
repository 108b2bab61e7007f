#include "AtomicFileWriter.h"

#include "airwright/core/project/ProjectFileError.h"

#include <atomic>
#include <cerrno>
#include <cstring>
#include <string>
#include <system_error>

#if defined(_WIN32)
#include <fstream>
#include <process.h>
#else
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>
#endif

namespace Airwright::Core::Project {

namespace {

namespace fs = std::filesystem;

[[noreturn]] void fail(const fs::path& file, const std::string& what, int error)
{
    throw ProjectFileError({{"", what + ": " + std::generic_category().message(error)}}, file);
}

fs::path siblingTemporary(const fs::path& target, const char* purpose)
{
    static std::atomic<unsigned> counter{0};
#if defined(_WIN32)
    const long pid = static_cast<long>(_getpid());
#else
    const long pid = static_cast<long>(::getpid());
#endif
    fs::path name = target;
    name.replace_filename("." + target.filename().string() + "." + purpose + "-" + std::to_string(pid) + "-" +
                          std::to_string(counter.fetch_add(1)));
    return name;
}

void removeQuietly(const fs::path& path)
{
    std::error_code ignored;
    fs::remove(path, ignored);
}

#if defined(_WIN32)
void writeDurably(const fs::path& temporary, std::string_view content, const fs::path& target)
{
    std::ofstream out(temporary, std::ios::binary | std::ios::trunc);
    if (!out)
        fail(target, "cannot create a temporary file in its folder", errno);
    out.write(content.data(), static_cast<std::streamsize>(content.size()));
    out.flush();
    if (!out)
        fail(target, "cannot write", errno);
}

void syncFolder(const fs::path& /*folder*/) {}
#else
void writeDurably(const fs::path& temporary, std::string_view content, const fs::path& target)
{
    const int fd = ::open(temporary.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
    if (fd < 0)
        fail(target, "cannot create a temporary file in its folder", errno);
    std::size_t done = 0;
    while (done < content.size()) {
        const ssize_t n = ::write(fd, content.data() + done, content.size() - done);
        if (n < 0 && errno == EINTR)
            continue;
        if (n <= 0) {
            const int error = n < 0 ? errno : EIO;
            ::close(fd);
            removeQuietly(temporary);
            fail(target, "cannot write", error);
        }
        done += static_cast<std::size_t>(n);
    }
    if (::fsync(fd) != 0) {
        const int error = errno;
        ::close(fd);
        removeQuietly(temporary);
        fail(target, "cannot flush to disk", error);
    }
    if (::close(fd) != 0) {
        const int error = errno;
        removeQuietly(temporary);
        fail(target, "cannot write", error);
    }
}

// Makes the renames themselves durable; best effort, as not every file system
// allows opening a folder.
void syncFolder(const fs::path& folder)
{
    const int fd = ::open(folder.c_str(), O_RDONLY | O_DIRECTORY | O_CLOEXEC);
    if (fd < 0)
        return;
    ::fsync(fd);
    ::close(fd);
}
#endif

} // namespace

fs::path AtomicFileWriter::backupPath(const fs::path& target)
{
    fs::path backup = target;
    backup += ".bak";
    return backup;
}

void AtomicFileWriter::write(const fs::path& target, std::string_view content)
{
    if (target.empty() || !target.has_filename())
        throw ProjectFileError({{"", "cannot write: no file name given"}}, target);
    std::error_code ec;
    if (fs::is_directory(target, ec))
        throw ProjectFileError({{"", "cannot write: is a folder"}}, target);

    const fs::path folder = target.parent_path().empty() ? fs::path(".") : target.parent_path();
    const fs::path temporary = siblingTemporary(target, "tmp");
    writeDurably(temporary, content, target);

    // Keep the previous version: a hard link costs nothing and leaves the target in
    // place until the final rename; a copy where links are not supported.
    if (fs::exists(target, ec)) {
        const fs::path backupTemporary = siblingTemporary(target, "bak");
        fs::create_hard_link(target, backupTemporary, ec);
        if (ec) {
            ec.clear();
            fs::copy_file(target, backupTemporary, fs::copy_options::overwrite_existing, ec);
        }
        if (!ec)
            fs::rename(backupTemporary, backupPath(target), ec);
        if (ec) {
            removeQuietly(backupTemporary);
            removeQuietly(temporary);
            throw ProjectFileError(
                {{"", "cannot keep the previous version as " + backupPath(target).string() + ": " + ec.message()}},
                target);
        }
    }

    fs::rename(temporary, target, ec);
    if (ec) {
        removeQuietly(temporary);
        throw ProjectFileError({{"", "cannot write: " + ec.message()}}, target);
    }
    syncFolder(folder);
}

} // namespace Airwright::Core::Project
