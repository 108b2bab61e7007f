#include "JsonDocumentParser.h"

#include <set>
#include <string>
#include <vector>

namespace Airwright::Core::Project {

namespace {

// Where the parser is, to name the path of a duplicate key.
class PathTracker {
public:
    explicit PathTracker(IssueLog& log) : m_log(log) {}

    bool onEvent(Json::parse_event_t event, const Json& parsed)
    {
        switch (event) {
        case Json::parse_event_t::object_start:
            m_frames.push_back({false, 0, {}, {}});
            break;
        case Json::parse_event_t::array_start:
            m_frames.push_back({true, 0, {}, {}});
            break;
        case Json::parse_event_t::key: {
            Frame& top = m_frames.back();
            top.key = parsed.get<std::string>();
            if (!top.keys.insert(top.key).second)
                m_log.error(path(), "key given twice in the same object; give it once");
            break;
        }
        case Json::parse_event_t::object_end:
        case Json::parse_event_t::array_end:
            m_frames.pop_back();
            advance();
            break;
        case Json::parse_event_t::value:
            advance();
            break;
        }
        return true; // keep everything
    }

private:
    struct Frame {
        bool array;
        std::size_t index;
        std::string key;
        std::set<std::string> keys;
    };

    void advance()
    {
        if (!m_frames.empty() && m_frames.back().array)
            ++m_frames.back().index;
    }

    std::string path() const
    {
        std::string text;
        for (const Frame& f : m_frames)
            text = f.array ? indexPath(text, f.index) : childPath(text, f.key);
        return text;
    }

    IssueLog& m_log;
    std::vector<Frame> m_frames;
};

struct Position {
    std::size_t line = 1;
    std::size_t column = 1;
};

// nlohmann reports the byte count up to and including the character it stopped
// at; the position of that character.
Position positionOf(std::string_view text, std::size_t byte)
{
    Position p;
    const std::size_t end = std::min(byte > 0 ? byte - 1 : 0, text.size());
    for (std::size_t i = 0; i < end; ++i) {
        if (text[i] == '\n') {
            ++p.line;
            p.column = 1;
        } else {
            ++p.column;
        }
    }
    return p;
}

// "[json.exception.parse_error.101] parse error at line 3, column 8: syntax error
// while parsing value - unexpected '}'; ..." -> "syntax error while parsing value - ..."
std::string describe(const std::string& what)
{
    const auto start = what.find("syntax error");
    if (start != std::string::npos)
        return what.substr(start);
    const auto bracket = what.find("] ");
    return bracket == std::string::npos ? what : what.substr(bracket + 2);
}

} // namespace

std::optional<Json> JsonDocumentParser::parse(std::string_view text, IssueLog& log)
{
    PathTracker tracker(log);
    try {
        return Json::parse(text.begin(), text.end(), [&](int /*depth*/, Json::parse_event_t event, Json& parsed) {
            return tracker.onEvent(event, parsed);
        });
    } catch (const Json::parse_error& e) {
        const Position p = positionOf(text, e.byte);
        log.error("", "line " + std::to_string(p.line) + ", column " + std::to_string(p.column) + ": " +
                          describe(e.what()));
    } catch (const Json::exception& e) {
        // Out-of-range numbers (1e400) and the like: no position from the library.
        log.error("", "not valid JSON: " + describe(e.what()));
    }
    return std::nullopt;
}

} // namespace Airwright::Core::Project
